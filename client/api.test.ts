import { describe, expect, test } from 'vitest';
import { urlOf } from './api';

describe('urlOf: a key of the /api table and its parameters → the address called', () => {
  test('fills each :param in, encoded', () => {
    expect(urlOf('PATCH /api/jobs/:id/parts/:partId', { id: 'a/b', partId: 'p 1' })).toBe('/api/jobs/a%2Fb/parts/p%201');
  });

  test('adds the query values that are set, leaving out empty ones', () => {
    expect(urlOf('GET /api/jobs', {}, { q: 'oak & ash', page: 2, status: '', customer: undefined })).toBe('/api/jobs?q=oak+%26+ash&page=2');
    expect(urlOf('GET /api/jobs/:id/nest-request', { id: 'j' }, { for: 'recuts' })).toBe('/api/jobs/j/nest-request?for=recuts');
  });

  test('refuses a key whose parameter has no value', () => {
    expect(() => urlOf('GET /api/jobs/:id/parts', {})).toThrow('no value for :id');
  });
});

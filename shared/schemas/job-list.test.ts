import { describe, expect, test } from 'vitest';
import { jobListQuerySchema, jobListSearch } from './job-list';

describe('the jobs list’s view in the URL', () => {
  test('a bare URL is the first page of open jobs, latest change first, 25 a page', () => {
    expect(jobListQuerySchema.parse({})).toEqual({ page: 1, size: 25, sort: 'updated.desc', q: '', status: '', customer: '' });
  });

  test('the query string leaves the defaults out, so /jobs stays /jobs and a link carries only what differs', () => {
    expect(jobListSearch(jobListQuerySchema.parse({}))).toBe('');
    const view = jobListQuerySchema.parse({ page: '3', size: '50', sort: 'name.asc', q: '  oak ', status: 'accepted', customer: 'Hollis' });
    expect(view).toMatchObject({ page: 3, size: 50, q: 'oak' });
    expect(jobListSearch(view)).toBe('q=oak&status=accepted&customer=Hollis&sort=name.asc&size=50&page=3');
    // And back: the string parses to the same view.
    expect(jobListQuerySchema.parse(Object.fromEntries(new URLSearchParams(jobListSearch(view))))).toEqual(view);
  });
});

import { describe, expect, test } from 'vitest';
import { homeFor, navFor } from './nav';

describe('navigation by role (PRODUCT.md, "Users and roles")', () => {
  test.each([
    ['owner', ['Jobs', 'Setup cards', 'Stock room', 'Yield ledger', 'Shop floor', 'Team', 'Shop settings']],
    ['estimator', ['Jobs', 'Setup cards', 'Stock room']],
    ['cutter', ['Jobs', 'Setup cards', 'Stock room', 'Shop floor']],
  ] as const)('the %s sees %j', (role, labels) => {
    expect(navFor(role).map((i) => i.label)).toEqual(labels);
  });

  test('a cutter starts on the shop floor, everyone else on jobs', () => {
    expect(homeFor('cutter')).toBe('/shop-floor');
    expect(homeFor('owner')).toBe('/jobs');
    expect(homeFor('estimator')).toBe('/jobs');
  });
});

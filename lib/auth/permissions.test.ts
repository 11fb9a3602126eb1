import { describe, expect, test } from 'vitest';
import { can, PERMISSIONS, ROLES } from './permissions';

describe('the role table (PRODUCT.md, "Users and roles")', () => {
  test('the owner may do everything', () => {
    for (const p of PERMISSIONS) expect(can('owner', p)).toBe(true);
  });

  test.each([
    ['estimator', 'team:manage', false],
    ['estimator', 'mail:manage', false],
    ['cutter', 'mail:manage', false],
    ['estimator', 'stock:write', false],
    ['estimator', 'stock:read', true],
    ['estimator', 'nest:run', true],
    ['cutter', 'prices:read', false],
    ['cutter', 'jobs:write', false],
    ['cutter', 'sawsteps:tick', true],
    ['cutter', 'offcuts:record', true],
  ] as const)('%s may %s: %s', (role, permission, expected) => {
    expect(can(role, permission)).toBe(expected);
  });

  test('every role has at least read access to jobs', () => {
    for (const r of ROLES) expect(can(r, 'jobs:read')).toBe(true);
  });
});

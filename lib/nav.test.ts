import fs from 'node:fs';
import { describe, expect, test } from 'vitest';
import { ROLES } from '@/lib/auth/permissions';
import { homeFor, JOB_SECTIONS, jobSectionsFor, NAV_ITEMS, navFor } from './nav';

describe('navigation by role (PRODUCT.md, "Users and roles")', () => {
  test.each([
    [
      'owner',
      [
        'Jobs',
        'Customers',
        'Setup cards',
        'Stock room',
        'Purchase orders',
        'Yield ledger',
        'Reports',
        'Shop floor',
        'Team',
        'Outbox',
        'Shop settings',
      ],
    ],
    ['estimator', ['Jobs', 'Customers', 'Setup cards', 'Stock room', 'Purchase orders', 'Reports']],
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

/** The permission a page asks for, read from its source: requirePageUser('…') or jobSection(params, '…'). */
function pagePermission(file: string): string | null {
  const source = fs.readFileSync(file, 'utf8');
  return /requirePageUser\('([a-z]+:[a-z]+)'\)/.exec(source)?.[1] ?? /jobSection\(params, '([a-z]+:[a-z]+)'\)/.exec(source)?.[1] ?? null;
}

describe('links people see', () => {
  test('each job section link asks for exactly the permission its page requires, so nobody is shown a page that refuses them', () => {
    for (const s of JOB_SECTIONS) expect(pagePermission(`app/(app)/jobs/[id]${s.path}/page.tsx`), s.label).toBe(s.permission);
  });

  test('each main navigation link asks for exactly the permission its page requires', () => {
    for (const item of NAV_ITEMS) expect(pagePermission(`app/(app)${item.href}/page.tsx`), item.label).toBe(item.permission);
  });

  test('a cutter sees no takeoff (it is priced) and no owner pages; every role sees the cut list', () => {
    expect(jobSectionsFor('cutter').map((s) => s.label)).toEqual(['Cut list', 'Drawer schedules', 'Plan']);
    expect(navFor('cutter').map((i) => i.href)).not.toContain('/team');
    for (const role of ROLES) expect(jobSectionsFor(role)[0].label).toBe('Cut list');
  });
});

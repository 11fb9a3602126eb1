/**
 * Every main page, as each role that may open it, checked with axe-core (the Deque engine behind most accessibility
 * audits; rules from WCAG 2.1 A and AA): no serious or critical violation anywhere. The owner at a desk (1440 px), the
 * estimator on a tablet (820 px) and the cutter on a phone (390 px), so each width is checked on someone's pages;
 * the pages with no sign-in are checked too.
 */
import AxeBuilder from '@axe-core/playwright';
import { can } from '../../lib/auth/permissions';
import { expect, test, type Page } from './support/test';
import { demoIds, MORE_PAGES, PAGES, settle } from './support/pages';
import { signIn, type DemoRole } from './support/session';

const WHO: { role: DemoRole; width: number; height: number }[] = [
  { role: 'owner', width: 1440, height: 900 },
  { role: 'estimator', width: 820, height: 1180 },
  { role: 'cutter', width: 390, height: 844 },
];

/** Serious and critical violations, one line each: the rule, what it means, and where. */
async function violations(page: Page): Promise<string[]> {
  const result = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  return result.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => {
      const where = v.nodes.map((n) => `${n.target.join(' ')}${n.any[0]?.message ? ` (${n.any[0].message})` : ''}`);
      return `${v.id} (${v.impact}): ${v.help} — ${where.slice(0, 4).join('; ')}`;
    });
}

for (const who of WHO) {
  test.describe(`the ${who.role} at ${who.width} px`, () => {
    test.use({ viewport: { width: who.width, height: who.height } });

    test(`no serious or critical accessibility violation on the ${who.role}'s pages`, async ({ page }) => {
      test.setTimeout(240_000);
      await signIn(page, who.role);
      const ids = await demoIds(page);
      const found: string[] = [];
      const visited: string[] = [];
      for (const p of [...PAGES, ...MORE_PAGES].filter((p) => can(who.role, p.permission))) {
        await page.goto(p.path(ids));
        await settle(page, p.heading);
        visited.push(p.slug);
        for (const v of await violations(page)) found.push(`${p.slug}: ${v}`);
      }
      expect(visited.length).toBeGreaterThan(3);
      expect(found).toEqual([]);
    });
  });
}

test('no serious or critical accessibility violation on the pages with no sign-in', async ({ page }) => {
  const found: string[] = [];
  for (const [path, heading] of [
    ['/sign-in', /Sign in/],
    ['/forgot-password', /password/i],
  ] as const) {
    await page.goto(path);
    await expect(page.getByRole('heading', { level: 1, name: heading })).toBeVisible();
    for (const v of await violations(page)) found.push(`${path}: ${v}`);
  }
  expect(found).toEqual([]);
});

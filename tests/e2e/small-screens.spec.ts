/**
 * Every main page, as each role, on a phone (390 × 844), a tablet upright (820 × 1180) and a tablet lying down or a
 * small laptop (1024 × 768): nothing may push the page sideways (wide tables scroll inside themselves), no text may
 * be clipped, and the console stays clean (the shared fixture fails the test on any console or page error).
 * Screenshots of every page land in test-results/screens*.
 */
import { can, type Permission } from '../../lib/auth/permissions';
import { expect, test, type Page } from './support/test';
import { clippedText, pageOverflow } from './support/layout-checks';
import { shot, signIn, type DemoRole } from './support/session';
import { jobId as jobIdByName } from './support/plans';

const VIEWPORTS = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'tablet', width: 820, height: 1180 },
  { name: 'small-desk', width: 1024, height: 768 },
] as const;

interface Ids {
  jobId: string;
  planId: string;
  partId: string;
}

/** The demo kitchen, its released plan and one of its parts, found through the API as any client would. */
async function demoIds(page: Page): Promise<Ids> {
  const jobId = await jobIdByName(page, 'Hollis kitchen');
  const list = await (await page.request.get(`/api/jobs/${jobId}/plans`)).json();
  const plans: { id: string; status: string }[] = Array.isArray(list) ? list : list.plans;
  const planId = plans.find((p) => p.status === 'released' || p.status === 'cutting')!.id;
  const partsBody = await (await page.request.get(`/api/jobs/${jobId}/parts`)).json();
  const parts: { id: string }[] = Array.isArray(partsBody) ? partsBody : partsBody.parts;
  return { jobId, planId, partId: parts[0].id };
}

const PAGES: { slug: string; path: (ids: Ids) => string; permission: Permission; heading: RegExp }[] = [
  { slug: 'jobs', path: () => '/jobs', permission: 'jobs:read', heading: /^Jobs$/ },
  { slug: 'cut-list', path: (i) => `/jobs/${i.jobId}`, permission: 'jobs:read', heading: /Hollis kitchen/ },
  { slug: 'drawers', path: (i) => `/jobs/${i.jobId}/drawers`, permission: 'jobs:read', heading: /Hollis kitchen/ },
  { slug: 'plans', path: (i) => `/jobs/${i.jobId}/plan`, permission: 'plans:read', heading: /Hollis kitchen/ },
  { slug: 'bench', path: (i) => `/jobs/${i.jobId}/plan/${i.planId}`, permission: 'plans:read', heading: /Hollis kitchen/ },
  { slug: 'takeoff', path: (i) => `/jobs/${i.jobId}/takeoff`, permission: 'prices:read', heading: /Hollis kitchen/ },
  { slug: 'customers', path: () => '/customers', permission: 'customers:read', heading: /^Customers$/ },
  { slug: 'setup-cards', path: () => '/setup-cards', permission: 'jobs:read', heading: /^Setup cards$/ },
  { slug: 'stock', path: () => '/stock', permission: 'stock:read', heading: /^Stock room$/ },
  { slug: 'stock-rack', path: () => '/stock?view=rack', permission: 'stock:read', heading: /^Stock room$/ },
  { slug: 'stock-history', path: () => '/stock?view=history', permission: 'stock:read', heading: /^Stock room$/ },
  { slug: 'yield', path: () => '/yield', permission: 'yield:read', heading: /^Yield ledger$/ },
  { slug: 'reports', path: () => '/reports?from=2026-06-01&to=2026-11-30', permission: 'yield:read', heading: /^Reports$/ },
  { slug: 'shop-floor', path: () => '/shop-floor', permission: 'sawsteps:tick', heading: /^Shop floor$/ },
  { slug: 'cutting', path: (i) => `/shop-floor/${i.planId}`, permission: 'sawsteps:tick', heading: /Hollis kitchen/ },
  { slug: 'saw-order', path: (i) => `/plans/${i.planId}/saw-order`, permission: 'plans:read', heading: /Saw order/ },
  { slug: 'tags', path: (i) => `/plans/${i.planId}/tags`, permission: 'plans:read', heading: /^Part tags$/ },
  { slug: 'finish', path: (i) => `/plans/${i.planId}/finish`, permission: 'plans:finish', heading: /^Finish/ },
  { slug: 'part', path: (i) => `/parts/${i.partId}`, permission: 'jobs:read', heading: /Base side/ },
  { slug: 'team', path: () => '/team', permission: 'team:manage', heading: /^Team$/ },
  { slug: 'settings', path: () => '/settings', permission: 'settings:write', heading: /^Shop settings$/ },
];

const ROLES: DemoRole[] = ['owner', 'estimator', 'cutter'];

async function settle(page: Page, heading: RegExp) {
  await expect(page.getByRole('heading', { level: 1, name: heading })).toBeVisible();
  await expect(page.getByRole('status').filter({ hasText: /Loading/ })).toHaveCount(0);
  await page.waitForLoadState('networkidle');
}

for (const vp of VIEWPORTS) {
  test.describe(`${vp.name} ${vp.width} × ${vp.height}`, () => {
    test.use({ viewport: { width: vp.width, height: vp.height } });

    for (const role of ROLES) {
      test(`the ${role}'s pages fit ${vp.width} px without sideways scrolling or clipped text`, async ({ page }) => {
        test.setTimeout(180_000);
        await signIn(page, role);
        const ids = await demoIds(page);
        const problems: string[] = [];
        for (const p of PAGES.filter((p) => can(role, p.permission))) {
          await page.goto(p.path(ids));
          await settle(page, p.heading);
          const overflow = await pageOverflow(page);
          if (overflow)
            problems.push(
              `${p.slug}: the page is ${overflow.scrollWidth} px wide in a ${overflow.innerWidth} px window (widest: ${overflow.culprits.join('; ')})`,
            );
          for (const c of await clippedText(page)) problems.push(`${p.slug}: clipped text ${c}`);
          await shot(page, `walk-${vp.width}-${role}-${p.slug}`);
        }
        expect(problems).toEqual([]);
      });
    }

    test(`the sign-in page fits ${vp.width} px`, async ({ page }) => {
      await page.goto('/sign-in');
      await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();
      expect(await pageOverflow(page)).toBeNull();
      await shot(page, `walk-${vp.width}-sign-in`);
    });
  });
}

test.describe('the menu on a phone', () => {
  test.use({ viewport: { width: 390, height: 844 } });

  test('the sidebar folds away behind a Menu button that opens it, goes where it is told and closes', async ({ page }) => {
    await signIn(page, 'cutter');
    const nav = page.getByRole('navigation', { name: 'Main' });
    await expect(nav).toBeHidden();
    const menu = page.getByRole('button', { name: 'Menu' });
    await expect(menu).toHaveAttribute('aria-expanded', 'false');
    const box = (await menu.boundingBox())!;
    expect(box.height).toBeGreaterThanOrEqual(44);
    await menu.click();
    await expect(nav).toBeVisible();
    // The sidebar slides in from the left edge and stands over the page.
    await expect.poll(async () => (await page.locator('#app-sidebar').boundingBox())?.x).toBe(0);
    expect(await nav.getByRole('link', { name: /^Shop floor/ }).isVisible()).toBe(true);
    await shot(page, 'walk-390-cutter-menu-open');
    await page.keyboard.press('Escape');
    await expect(nav).toBeHidden();

    await page.getByRole('button', { name: 'Menu' }).click();
    await nav.getByRole('link', { name: /^Stock room/ }).click();
    await expect(page.getByRole('heading', { level: 1, name: 'Stock room' })).toBeVisible();
    await expect(nav).toBeHidden();
    await expect(page.getByRole('button', { name: 'Menu' })).toHaveAttribute('aria-expanded', 'false');
  });
});

test.describe('the drawer preview on a phone', () => {
  test.use({ viewport: { width: 390, height: 844 } });

  test('every size on the box drawing shows whole, however narrow the box', async ({ page }) => {
    await signIn(page, 'estimator');
    await page.goto(`/jobs/${(await demoIds(page)).jobId}/drawers`);
    await page.getByRole('button', { name: 'New drawer schedule' }).click();
    const form = page.getByRole('form', { name: 'New drawer schedule' });
    await form.getByLabel('Label').fill('Narrow spice drawer');
    await form.getByLabel('Boxes').fill('1');
    // A narrow, shallow box: its height label is the longest thing beside the smallest drawing.
    await form.getByLabel('Opening width').fill('4 3/4');
    await form.getByLabel('Opening height').fill('6 5/8');
    await form.getByLabel('Opening depth').fill('21');
    await form.getByLabel('Opening depth').blur();
    const preview = page.getByTestId('box-preview');
    await expect(preview).toBeVisible();
    const labels = await preview.locator('text').allTextContents();
    expect(labels.some((l) => /″$/.test(l) && l.includes('-'))).toBe(true);
    expect(await clippedText(preview)).toEqual([]);
    expect(await clippedText(form)).toEqual([]);
    expect(await pageOverflow(page)).toBeNull();
    await preview.scrollIntoViewIfNeeded();
    await shot(page, 'walk-390-estimator-drawer-preview');
  });
});

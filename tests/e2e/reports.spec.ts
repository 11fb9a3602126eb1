/**
 * The owner's reports over the demo shop's six months of past jobs: the chart and its table show the same periods,
 * the filters live in the URL, the CSV holds the table's rows, dates are on the shop's clock (the last past job
 * ended at 23:30 on 19 November in Chicago, so its week is the 16th's, not the 20th's), and estimators and
 * cutters are not shown the page.
 */
import Papa from 'papaparse';
import { expect, test } from './support/test';
import { pageOverflow } from './support/layout-checks';
import { shot, signIn } from './support/session';

const RANGE = '?from=2026-06-01&to=2026-11-30';

test('the owner reads yield and offcut use by month, then by week for one material, and downloads the same figures', async ({ page }) => {
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'owner');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: /^Reports/ }).click();
  await expect(page.getByRole('heading', { level: 1, name: 'Reports' })).toBeVisible();
  await page.goto(`/reports${RANGE}`);

  const table = page.getByRole('table', { name: 'Yield by period and material' });
  const rows = table.getByTestId('yield-row');
  // Six months of past jobs, each month at least one material.
  await expect(rows.first()).toBeVisible();
  const periods = new Set((await rows.locator('td:first-child').allTextContents()).map((t) => t.trim()));
  expect([...periods]).toEqual(['Jun 2026', 'Jul 2026', 'Aug 2026', 'Sep 2026', 'Oct 2026', 'Nov 2026']);
  // The chart draws one point per period, and its description names each period's yield.
  await expect(page.locator('.recharts-surface').first()).toBeVisible();
  const described = (await page.getByRole('img', { name: /^Yield over time/ }).getAttribute('aria-label')) ?? '';
  for (const p of periods) expect(described).toContain(p);
  expect(described).not.toContain('NaN');
  await expect(page.getByTestId('report-yield')).toContainText(/\d+\.\d %/);
  await expect(page.getByRole('table', { name: 'Offcut use by period' }).getByTestId('offcut-row')).toHaveCount(6);
  await shot(page, 'reports-1-by-month-desk');

  // The CSV has the table's rows, in the same order.
  const href = await page.getByRole('link', { name: 'Download CSV' }).first().getAttribute('href');
  const csv = await (await page.request.get(href!)).text();
  const lines = Papa.parse<string[]>(csv.replace(/^\uFEFF/, '').trim()).data;
  expect(lines[0].slice(0, 4)).toEqual(['Period from', 'Material', 'Thickness (mm)', 'Plans']);
  expect(lines.length - 1).toBe(await rows.count());
  expect(csv).not.toContain('NaN');

  // By week, Baltic birch only: the filters stay in the URL.
  const filters = page.getByRole('form', { name: 'Report filters' });
  await filters.getByLabel('Group by').selectOption('week');
  await filters.getByLabel('Material').selectOption('Baltic birch');
  await filters.getByRole('button', { name: 'Show' }).click();
  await expect(page).toHaveURL(/by=week/);
  await expect(page).toHaveURL(/material=Baltic\+birch/);
  const weekly = page.getByRole('table', { name: 'Yield by period and material' }).getByTestId('yield-row');
  await expect(weekly.first()).toBeVisible();
  for (const t of await weekly.locator('td:nth-child(2)').allTextContents()) expect(t).toContain('Baltic birch');
  await expect(weekly.filter({ hasText: 'Week of Nov 16, 2026' })).not.toHaveCount(0);
  await expect(weekly.filter({ hasText: 'Week of Nov 23, 2026' })).toHaveCount(0);
  await page.reload();
  await expect(page.getByLabel('Group by')).toHaveValue('week');
  await shot(page, 'reports-2-by-week-birch-desk');

  // A range that runs backwards is named, and the page still shows the default.
  await page.goto('/reports?from=2026-11-30&to=2026-06-01');
  await expect(page.getByRole('alert').filter({ hasText: 'The range runs backwards' })).toBeVisible();

  for (const width of [820, 390]) {
    await page.setViewportSize({ width, height: width === 390 ? 844 : 1180 });
    await page.goto(`/reports${RANGE}`);
    await expect(page.locator('.recharts-surface').first()).toBeVisible();
    expect(await pageOverflow(page), `the reports scroll sideways at ${width} px`).toBeNull();
    await shot(page, `reports-3-${width}`);
  }
});

test('estimators and cutters are not shown the reports, and the CSV refuses them', async ({ browser }) => {
  for (const role of ['estimator', 'cutter'] as const) {
    const page = await browser.newPage();
    await signIn(page, role);
    await expect(page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: /^Reports/ })).toHaveCount(0);
    await page.goto('/reports');
    await expect(page.getByRole('heading', { name: 'Not open to your role' })).toBeVisible();
    expect((await page.request.get('/api/reports/yield')).status()).toBe(403);
    await page.close();
  }
});

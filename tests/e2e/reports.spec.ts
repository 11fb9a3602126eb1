/**
 * The owner's reports over the demo shop's six months of past jobs: the chart and its table show the same periods,
 * the filters live in the URL, the CSV holds the table's rows, dates are on the shop's clock (the last past job
 * ended at 23:30 on 19 November in Chicago, so its week is the 16th's, not the 20th's); estimators see the quoting
 * report only, cutters no report.
 */
import Papa from 'papaparse';
import { expect, test } from './support/test';
import { pageOverflow } from './support/layout-checks';
import { shot, signIn } from './support/session';

const RANGE = '?from=2026-06-01&to=2026-11-30';

test('the owner reads yield and offcut use by month, then by week for one material, and downloads the same figures', async ({ page }) => {
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'owner');
  await page
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: /^Reports/ })
    .click();
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

test('the estimator sees only the quoting report; the cutter no report; the CSVs refuse them alike', async ({ browser }) => {
  const estimator = await browser.newPage();
  await signIn(estimator, 'estimator');
  await estimator
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: /^Reports/ })
    .click();
  await expect(estimator.getByRole('heading', { level: 2, name: 'Quoting' })).toBeVisible();
  await expect(estimator.getByRole('heading', { level: 2, name: 'Yield over time' })).toHaveCount(0);
  await expect(estimator.getByRole('heading', { level: 2, name: 'Stock value' })).toHaveCount(0);
  expect((await estimator.request.get('/api/reports/yield')).status()).toBe(403);
  expect((await estimator.request.get('/api/reports/quoting')).status()).toBe(200);
  await estimator.close();

  const cutter = await browser.newPage();
  await signIn(cutter, 'cutter');
  await expect(cutter.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: /^Reports/ })).toHaveCount(0);
  await cutter.goto('/reports');
  await expect(cutter.getByRole('heading', { name: 'Not open to your role' })).toBeVisible();
  for (const report of ['yield', 'quoting']) expect((await cutter.request.get(`/api/reports/${report}`)).status()).toBe(403);
  await cutter.close();
});

test('the owner reads the quoting report of the demo’s past quotes: counts by month, value won, deposits, and material quoted against used', async ({
  page,
}) => {
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'owner');
  await page.goto(`/reports${RANGE}`);
  const rows = page.getByRole('table', { name: 'Quotes by period' }).getByTestId('quoting-row');
  await expect(rows.first()).toBeVisible();
  // Each past job's quote was accepted and its deposit paid; one more was declined and one ran out (seeds/demo-history.ts).
  const cells = await rows.evaluateAll((trs) => trs.map((tr) => [...tr.querySelectorAll('td')].map((td) => td.textContent?.trim() ?? '')));
  const sum = (col: number) => cells.reduce((n, r) => n + Number(r[col]), 0);
  expect([sum(1), sum(2), sum(3), sum(4)]).toEqual([8, 6, 1, 1]);
  await expect(page.getByTestId('report-win-rate')).toContainText('75.0 %');
  await expect(page.getByRole('table', { name: 'Material quoted against used, per job' }).getByTestId('quoted-vs-used')).toHaveCount(6);
  const described = (await page.getByRole('img', { name: /^Quotes per period/ }).getAttribute('aria-label')) ?? '';
  expect(described).not.toContain('NaN');
  const href = await page.getByRole('link', { name: 'Download CSV' }).last().getAttribute('href');
  expect(href).toMatch(/^\/api\/reports\/quoting\?/);
  const csv = Papa.parse<string[]>((await (await page.request.get(href!)).text()).replace(/^\uFEFF/, '').trim()).data;
  expect(csv.length - 1).toBe(cells.length);
  for (const width of [1440, 390]) {
    await page.setViewportSize({ width, height: 900 });
    await page.getByRole('heading', { level: 2, name: 'Quoting' }).scrollIntoViewIfNeeded();
    expect(await pageOverflow(page), `the reports scroll sideways at ${width} px`).toBeNull();
    await shot(page, `reports-4-quoting-${width}`);
  }
});

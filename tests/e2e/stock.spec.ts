import { expect, test, type Page } from './support/test';
import { shot, signIn } from './support/session';

/** The seeded ¼″ maple ply sheets (nine on hand, none reserved by the demo plan). */
const quarterPly = (page: Page) => page.getByTestId('stock-row').filter({ hasText: 'Maple ply' }).filter({ hasText: '1/4"' });

test('the owner receives stock, adjusts a count with a reason, scraps an offcut, and sees it all in the history', async ({ page }) => {
  await signIn(page, 'owner');
  await page.goto('/stock');
  await expect(page.getByTestId('stock-value')).toContainText('$');
  await expect(page.getByText('low', { exact: true }).first()).toBeVisible();
  await shot(page, 'stock-owner');

  await expect(quarterPly(page).getByTestId('on-hand')).toHaveText('9');
  await quarterPly(page)
    .getByRole('button', { name: /^Receive / })
    .click();
  await page.getByLabel('Pieces received').fill('3');
  await page.getByLabel('Note (delivery, supplier)').fill('Cedar Run delivery 4471');
  await page.getByRole('button', { name: 'Receive', exact: true }).click();
  await expect(quarterPly(page).getByTestId('on-hand')).toHaveText('12');

  await quarterPly(page)
    .getByRole('button', { name: /^Adjust count/ })
    .click();
  await page.getByLabel(/Counted on the rack/).fill('11');
  await page.getByRole('button', { name: 'Save count' }).click();
  await expect(page.getByText('Say why the count changed (counted, damaged, found…).')).toBeVisible();
  await page.getByLabel('Reason').fill('Counted: one sheet with a crushed corner');
  await page.getByRole('button', { name: 'Save count' }).click();
  await expect(quarterPly(page).getByTestId('on-hand')).toHaveText('11');
  await shot(page, 'stock-owner-after-count');

  // One size's own history, from its name.
  await quarterPly(page).getByRole('link', { name: 'Maple ply' }).click();
  await expect(page).toHaveURL(/view=history&item=/);
  // Opening count, the demo plan's reservation, then this test's receipt and adjustment (other specs may have
  // released plans on this size too, so the rows are named, not counted).
  const movements = page.getByTestId('movement');
  await expect(movements.filter({ hasText: 'Cedar Run delivery 4471' })).toHaveCount(1);
  await expect(movements.filter({ hasText: 'crushed corner' })).toHaveCount(1);
  await expect(page.locator('[data-testid="movement"][data-kind="received"]')).not.toHaveCount(0);
  await expect(page.locator('[data-testid="movement"][data-kind="adjusted"]')).toHaveCount(1);
  await page.goto('/stock');

  // Filters live in the URL.
  await page.getByLabel('Material').fill('Baltic');
  await expect(page).toHaveURL(/material=Baltic/);
  await expect(page.getByTestId('stock-row')).toHaveCount(3); // ¼″, ½″ and ¾″ Baltic birch

  await page.goto('/stock?view=rack');
  const birch = page.getByTestId('offcut').filter({ hasText: 'Offcut bin 1' });
  await expect(birch).toHaveCount(1);
  await birch.getByRole('button', { name: /^Scrap / }).click();
  await page.getByLabel('Reason for scrapping').fill('Delaminated face');
  await page.getByRole('button', { name: 'Scrap it' }).click();
  await expect(page.getByTestId('offcut').filter({ hasText: 'Offcut bin 1' })).toHaveCount(0);
  await shot(page, 'stock-owner-rack');

  await page.goto('/stock?view=history');
  const history = page.getByTestId('movement');
  await expect(history.filter({ hasText: 'Count adjusted' }).filter({ hasText: 'Maren Okafor' })).toContainText('crushed corner');
  await expect(history.filter({ hasText: 'Received' }).filter({ hasText: 'delivery 4471' })).toContainText('+3');
  // The demo's past jobs scrapped offcuts too: this one is the offcut scrapped here, with its reason.
  await expect(history.filter({ hasText: 'Scrapped' }).filter({ hasText: 'Delaminated face' })).toHaveCount(1);
  await shot(page, 'stock-owner-history');
});

test('the owner imports a stock CSV: bad rows are named, and only the valid rows are written when chosen', async ({ page }) => {
  await signIn(page, 'owner');
  await page.goto('/stock');
  await page.getByRole('button', { name: 'Import CSV' }).click();
  const csv = 'kind,material,thickness,length,width,quantity,cost\nsheet,Walnut ply,3/4",96,48,4,120.00\nsheet,Walnut ply,3/4",ninety,48,4,120.00\n';
  await page.getByLabel('Stock file (CSV)').setInputFiles({ name: 'delivery.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
  const check = page.getByTestId('import-check');
  await expect(check).toContainText('1 row ready; 1 with problems');
  await expect(page.getByRole('table', { name: 'Rows with problems' })).toContainText('length');
  await expect(page.getByRole('button', { name: 'Import all rows' })).toBeDisabled();
  await shot(page, 'stock-import-check');
  await page.getByRole('button', { name: 'Import only the 1 valid row' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Imported 1 size' })).toBeVisible();
  await expect(page.getByTestId('stock-row').filter({ hasText: 'Walnut ply' })).toHaveCount(1);
});

test('the estimator reads the takeoff for the kitchen; a cutter may not', async ({ page, browser }) => {
  await signIn(page, 'estimator');
  await page.goto('/jobs?q=Hollis%20kitchen');
  await page.getByRole('link', { name: 'Hollis kitchen' }).first().click();
  await expect(page).toHaveURL(/\/jobs\/[0-9a-f-]{36}$/);
  const jobUrl = page.url();
  await page.goto(`${jobUrl}/takeoff`);
  // Other specs may have saved newer plans on this job: pick the seeded one when there is a choice.
  const picker = page.getByRole('navigation', { name: 'Plans of this job' });
  if (await picker.count()) await picker.getByRole('link', { name: /^Carcasses and backs/ }).click();
  await expect(page.getByRole('heading', { name: /Takeoff for “Carcasses and backs”/ })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Pull from stock' }).getByTestId('takeoff-line').first()).toContainText('Maple ply');
  await expect(page.getByTestId('takeoff-total-allowance')).toContainText('$');
  await expect(page.getByTestId('takeoff-covered')).toContainText(/cover it now/);
  await shot(page, 'takeoff-estimator');

  const cutter = await browser.newPage();
  await signIn(cutter, 'cutter');
  await cutter.goto(`${jobUrl}/takeoff`);
  await expect(cutter).toHaveURL(/\/no-access/);
  await cutter.close();
});

test('the cutter finishes the seeded released plan and its offcuts appear on the rack where they were put', async ({ page }) => {
  await signIn(page, 'cutter');
  await page.goto('/shop-floor');
  // The seeded plan by name: other specs may have released plans of their own.
  const href = await page.getByTestId('queue-plan').filter({ hasText: 'Carcasses and backs' }).getAttribute('href');
  const planId = href?.match(/[0-9a-f-]{36}/)?.[0];
  expect(planId).toBeTruthy();

  await page.goto(`/plans/${planId}/finish`);
  await expect(page.getByRole('heading', { name: 'Finish: Carcasses and backs' })).toBeVisible();
  const offcuts = await page.getByTestId('finish-offcut').count();
  expect(offcuts).toBeGreaterThan(0);
  await page.getByLabel('Rack location for offcuts').fill('Offcut bin 4');
  await shot(page, 'finish-cutter');
  await page.getByRole('button', { name: 'Mark the plan done' }).click();
  const result = page.getByTestId('finish-result');
  await expect(result).toContainText(`${offcuts} offcut${offcuts === 1 ? '' : 's'} on the rack`);
  await expect(result).not.toContainText('$');
  await shot(page, 'finish-cutter-done');

  await page.getByRole('link', { name: 'See the offcut rack' }).click();
  await expect(page.getByTestId('offcut').filter({ hasText: 'Offcut bin 4' })).toHaveCount(offcuts);
  await expect(page.getByText('$')).toHaveCount(0);
  await shot(page, 'stock-rack-cutter');

  // Done once: the plan has left the shop floor.
  const again = await page.request.post(`/api/plans/${planId}/done`, { data: {} });
  expect(again.status()).toBe(409);
});

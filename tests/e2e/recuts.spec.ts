/**
 * A part damaged at the saw, as the shop lives it: the estimator wins a job and releases its plan → the cutter cuts
 * it, marks one part damaged and finishes → the part is on the job's re-cut list → the estimator nests the re-cuts
 * (on the plan's own offcut) and releases → the cutter cuts the re-cut → the job is done. The job's status is read
 * from its page at each step.
 */
import { expect, test, type Page } from './support/test';
import { shot, signIn } from './support/session';

const DESK = { width: 1440, height: 900 };
const TABLET = { width: 820, height: 1180 };
const PHONE = { width: 390, height: 844 };
const inch = (n: number) => n * 25.4;

/** The job's status badge in its header. */
const statusOf = (page: Page) => page.getByTestId('job-status');

/** On the shop floor: tick every cut of every piece, as the cutter does, until the plan offers Finish. */
async function cutEveryStep(page: Page) {
  for (let i = 0; i < 200; i++) {
    const finishLink = page.getByRole('link', { name: 'Finish the plan' });
    if (await finishLink.isVisible()) return finishLink.click();
    const done = page.getByRole('button', { name: /^Done — cut \d+$/ });
    if (await done.isVisible()) {
      await Promise.all([page.waitForResponse((r) => r.url().includes('/steps') && r.request().method() === 'POST'), done.click()]);
      continue;
    }
    // This piece is cut: the next one not yet ticked off.
    await page.getByRole('navigation', { name: 'Stock pieces' }).getByRole('button').filter({ hasNotText: '✓' }).first().click();
  }
  throw new Error('The plan never offered Finish.');
}

test('a damaged part goes on the re-cut list, is nested on an offcut and cut, and the job reads right at each step', async ({ browser }) => {
  test.setTimeout(240_000);
  const stamp = Date.now();
  const material = `Rift ply ${stamp}`;
  const jobName = `Calloway hall cabinet ${stamp}`;

  // The owner racks a sheet size of its own for this job (so no other spec's offcuts or plans touch it).
  const owner = await browser.newPage({ viewport: DESK });
  await signIn(owner, 'owner');
  const stock = await owner.request.post('/api/stock', {
    data: {
      kind: 'sheet',
      material,
      nominalThickness: '3/4"',
      thickness: 18,
      length: inch(96),
      width: inch(48),
      onHand: 3,
      costCents: 8800,
      location: 'Rack D1',
    },
  });
  expect(stock.status()).toBe(201);
  const sheetId = (await stock.json()).id as string;

  // The estimator creates the job and its cut list, and marks it accepted in the job's own edit form.
  const estimator = await browser.newPage({ viewport: DESK });
  await signIn(estimator, 'estimator');
  await estimator.goto('/jobs');
  await estimator.getByRole('button', { name: 'New job' }).click();
  const form = estimator.getByRole('form', { name: 'New job' });
  await form.getByLabel('Job name').fill(jobName);
  await form.getByRole('button', { name: 'Create job' }).click();
  await expect(estimator.getByRole('heading', { level: 1, name: jobName })).toBeVisible();
  const jobId = estimator.url().split('/').pop()!;
  await expect(statusOf(estimator)).toHaveText('Quoting');
  for (const part of [
    { label: 'Side', quantity: 2, length: inch(30), width: inch(22) },
    { label: 'Shelf', quantity: 3, length: inch(22), width: inch(12), grain: 'any' },
  ]) {
    const res = await estimator.request.post(`/api/jobs/${jobId}/parts`, { data: { ...part, thickness: 18, material } });
    expect(res.status()).toBe(201);
  }

  await estimator.getByRole('button', { name: 'Edit job' }).click();
  const edit = estimator.getByRole('dialog', { name: 'Edit job' });
  await edit.getByLabel('Customer').fill('Dana Calloway');
  await edit.getByLabel('Due date').fill('2027-04-16');
  await edit.getByLabel('Notes').fill('Rift-sawn face, grain runs up the sides.');
  await expect(edit.getByLabel('Status').locator('option')).toHaveText(['Quoting', 'Accepted', 'Archived']);
  await edit.getByLabel('Status').selectOption('accepted');
  await shot(estimator, 'recuts-1-edit-job');
  await edit.getByRole('button', { name: 'Save changes' }).click();
  await expect(edit).toBeHidden();
  await expect(statusOf(estimator)).toHaveText('Accepted');
  await expect(estimator.getByText('Dana Calloway · due 2027-04-16')).toBeVisible();

  // Nest, save and release: the job is being cut.
  await estimator.getByRole('navigation', { name: 'Job sections' }).getByRole('link', { name: 'Plan' }).click();
  await expect(estimator.getByRole('table', { name: 'Re-cuts' })).toHaveCount(0);
  // This spec is about re-cuts: nested with no saw profile, in the panel style, so the offcuts are the ones the parts
  // leave on a whole sheet (the saws' own plans are in saw-order.spec.ts).
  await estimator.getByLabel('Cut on').selectOption('');
  await estimator.getByLabel('Search for (seconds)').fill('1');
  await estimator.getByRole('button', { name: 'Nest 5 parts' }).click();
  await expect(estimator.getByTestId('plan-summary')).toBeVisible({ timeout: 30_000 });
  await estimator.getByLabel('Plan name').fill('Hall cabinet');
  await estimator.getByRole('button', { name: 'Save as draft plan' }).click();
  await expect(estimator.getByTestId('bench-status')).toContainText('straight through-cuts');
  await estimator.getByRole('button', { name: 'Release plan to the saw' }).click();
  await expect(estimator.getByRole('link', { name: 'Saw order' })).toBeVisible();
  await expect(statusOf(estimator)).toHaveText('Cutting');

  // The cutter cuts it on the shop floor and finishes with one side damaged.
  const cutter = await browser.newPage({ viewport: TABLET });
  await signIn(cutter, 'cutter');
  await cutter.goto('/shop-floor');
  await cutter.getByTestId('queue-plan').filter({ hasText: 'Hall cabinet' }).filter({ hasText: jobName }).click();
  await cutEveryStep(cutter);
  await expect(cutter.getByRole('heading', { name: 'Finish: Hall cabinet' })).toBeVisible();
  await cutter.getByLabel('Rack location for offcuts').fill('Offcut bin 9');
  await cutter.getByRole('checkbox', { name: /^Side #1\b/ }).check();
  await cutter.getByLabel('What happened to Side #1').fill('Tear-out on the face');
  await shot(cutter, 'recuts-2-finish-damaged-tablet');
  await cutter.setViewportSize(PHONE);
  await shot(cutter, 'recuts-2-finish-damaged-phone');
  await cutter.getByRole('button', { name: 'Mark the plan done' }).click();
  const result = cutter.getByTestId('finish-result');
  await expect(result.getByTestId('finish-recuts')).toHaveText('1 damaged part on the job’s re-cut list.');
  await expect(result).toContainText('The job is now cutting.');
  await expect(result).not.toContainText('$');
  await shot(cutter, 'recuts-3-finish-result-phone');

  // The part is on the job's re-cut list; the cutter reads it but may not nest or cancel it.
  await cutter.getByRole('link', { name: 'See the re-cut list' }).click();
  await expect(statusOf(cutter)).toHaveText('Cutting');
  const list = cutter.getByRole('table', { name: 'Re-cuts' });
  await expect(list.getByTestId('recut')).toHaveCount(1);
  const recut = list.getByTestId('recut').first();
  await expect(recut).toContainText('Side #1');
  await expect(recut).toContainText('30″ × 22″');
  await expect(recut).toContainText(`18 mm ${material}`);
  await expect(recut).toContainText('Tear-out on the face');
  await expect(recut).toContainText('To re-cut');
  await expect(cutter.getByRole('link', { name: 'Nest the re-cuts' })).toHaveCount(0);
  await expect(recut.getByRole('button', { name: 'Cancel…' })).toHaveCount(0);
  await cutter.getByRole('heading', { name: 'Re-cuts' }).scrollIntoViewIfNeeded();
  await shot(cutter, 'recuts-4-list-cutter-phone');
  await cutter.setViewportSize(TABLET);
  await shot(cutter, 'recuts-4-list-cutter-tablet');

  // The estimator nests only the re-cuts: the one side goes on the offcut the first plan left.
  await estimator.goto(`/jobs/${jobId}/plan`);
  await expect(statusOf(estimator)).toHaveText('Cutting');
  await expect(estimator.getByTestId('recut-summary')).toHaveText('1 to re-cut');
  await shot(estimator, 'recuts-5-list-estimator-desk');
  await estimator.setViewportSize(PHONE);
  await estimator.getByRole('heading', { name: 'Re-cuts' }).scrollIntoViewIfNeeded();
  await shot(estimator, 'recuts-5-list-estimator-phone');
  await estimator.setViewportSize(DESK);
  await estimator.getByRole('link', { name: 'Nest the re-cuts' }).click();
  await expect(estimator.getByRole('heading', { name: 'Nest the re-cuts' })).toBeVisible();
  await estimator.getByLabel('Cut on').selectOption('');
  await estimator.getByLabel('Search for (seconds)').fill('1');
  await estimator.getByRole('button', { name: 'Nest 1 re-cut' }).click();
  const summary = estimator.getByTestId('plan-summary');
  await expect(summary).toBeVisible({ timeout: 30_000 });
  await expect(summary.getByRole('table', { name: 'Parts not placed' })).toHaveCount(0);
  const pull = summary.getByRole('table', { name: 'Stock to pull' }).getByRole('row');
  await expect(pull).toHaveCount(2);
  await expect(pull.nth(1)).toContainText('Offcut');
  await expect(pull.nth(1)).toContainText(material);
  await expect(pull.nth(1)).toContainText('Offcut bin 9');
  await expect(estimator.getByLabel('Plan name')).toHaveValue(/^Re-cuts /);
  await estimator.getByLabel('Plan name').fill('Hall cabinet re-cut');
  await shot(estimator, 'recuts-6-nested-recuts-desk');
  await estimator.getByRole('button', { name: 'Save as draft plan' }).click();
  await expect(estimator.getByTestId('bench-status')).toContainText('straight through-cuts');
  await expect(estimator.getByRole('heading', { level: 2, name: /Hall cabinet re-cut/ })).toContainText('Re-cuts');
  await estimator.getByRole('button', { name: 'Release plan to the saw' }).click();
  await expect(estimator.getByRole('link', { name: 'Saw order' })).toBeVisible();
  await expect(statusOf(estimator)).toHaveText('Cutting');
  await estimator.goto(`/jobs/${jobId}/plan`);
  await expect(estimator.getByRole('table', { name: 'Re-cuts' }).getByTestId('recut').first()).toContainText('In a released plan');
  await expect(estimator.getByRole('link', { name: 'Nest the re-cuts' })).toHaveCount(0);
  await expect(estimator.getByRole('table', { name: 'Plans' }).getByRole('row').filter({ hasText: 'Hall cabinet re-cut' })).toContainText('Re-cuts');

  // The cutter cuts the re-cut; it is closed, and with nothing left to cut the job is done.
  await cutter.goto('/shop-floor');
  await cutter.getByTestId('queue-plan').filter({ hasText: 'Hall cabinet re-cut' }).click();
  await cutEveryStep(cutter);
  await expect(cutter.getByTestId('finish-part')).toHaveText([/^Side #1 · re-cut #1/]);
  await shot(cutter, 'recuts-7-finish-recut-plan-tablet');
  await cutter.getByRole('button', { name: 'Mark the plan done' }).click();
  await expect(cutter.getByTestId('finish-result')).toContainText('1 re-cut cut and closed.');
  await expect(cutter.getByTestId('finish-result')).toContainText('The job is now done.');
  await cutter.goto(`/jobs/${jobId}/plan`);
  await expect(statusOf(cutter)).toHaveText('Done');
  await expect(cutter.getByRole('table', { name: 'Re-cuts' }).getByTestId('recut').first()).toContainText('Cut');
  await expect(cutter.getByTestId('recut-summary')).toHaveText('Nothing left to re-cut');
  await shot(cutter, 'recuts-8-done-tablet');

  // The stock history says what happened to the sheets: reserved, then cut — one row each, not a release and a cut.
  await owner.goto(`/stock?view=history&item=${sheetId}`);
  const rows = owner.getByTestId('movement');
  await expect(rows.filter({ hasText: 'Hall cabinet' })).toHaveCount(2);
  await expect(owner.locator('[data-testid="movement"][data-kind="reserved"]')).toHaveCount(1);
  const cut = owner.locator('[data-testid="movement"][data-kind="consumed"]');
  await expect(cut).toHaveCount(1);
  await expect(cut).toContainText('Cut (was reserved)');
  await expect(owner.locator('[data-testid="movement"][data-kind="released"]')).toHaveCount(0);
  await shot(owner, 'recuts-9-stock-history-desk');

  // The yield ledger shows the spoiled side apart from the saw's waste.
  await owner.goto('/yield');
  const ledger = owner.getByTestId('ledger-row').filter({ hasText: jobName });
  await expect(ledger).toHaveCount(2);
  await expect(ledger.filter({ hasNotText: 're-cut' }).getByTestId('ledger-spoiled')).toHaveText(/^\d+\.\d %$/);
  await expect(ledger.filter({ hasText: 're-cut' }).getByTestId('ledger-spoiled')).toHaveText('—');
  await shot(owner, 'recuts-10-yield-desk');

  // Done and delivered: the owner archives it, and it leaves the jobs list until the filter asks for it.
  await owner.goto(`/jobs/${jobId}`);
  await owner.getByRole('button', { name: 'Archive' }).click();
  await expect(statusOf(owner)).toHaveText('Archived');
  await owner.goto(`/jobs?q=${encodeURIComponent(jobName)}`);
  await expect(owner.getByText('No job matches these filters.')).toBeVisible();
  await owner.goto('/jobs?sort=updated.desc');
  // The list is paged, latest change first: had the archived job stayed, it would be on this first page.
  await expect(owner.getByRole('table', { name: 'Jobs' }).getByRole('link', { name: jobName })).toHaveCount(0);
  await expect(owner.getByText(/archived not shown/)).toBeVisible();
  await shot(owner, 'recuts-11-jobs-default-desk');
  await owner.goto(`/jobs?q=${encodeURIComponent(jobName)}`);
  await owner.getByLabel('Status').selectOption('archived');
  await expect(owner.getByRole('table', { name: 'Jobs' }).getByRole('link', { name: jobName })).toBeVisible();
  await shot(owner, 'recuts-12-archived-filter-desk');
});

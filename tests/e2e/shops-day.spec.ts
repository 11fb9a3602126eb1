/**
 * The shop's day, as a shop that has just installed Kerfwise lives it, with the demo shop's defaults and only what a
 * person types: the estimator creates a job → a drawer schedule with the form's defaults → a CSV with fractions and
 * millimetres → Nest places every part on the stock room's sheets → a drag on the bench, saved → the takeoff, whose
 * cost with the allowance stays within the allowance it states → release; the cutter, on a phone, ticks every cut
 * and finishes with one part damaged → the part is on the job's re-cut list; the owner sees the job's status follow
 * along. Screenshots at every step; any console error fails the test (support/test), and so does any page that
 * scrolls sideways on the phone.
 */
import { expect, test, type Page } from './support/test';
import { dragPart, pickMove, savedPlan } from './support/bench';
import { pageOverflow } from './support/layout-checks';
import { shot, signIn } from './support/session';

const DESK = { width: 1440, height: 900 };
const TABLET = { width: 820, height: 1180 };
const PHONE = { width: 390, height: 844 };

/** The cubbies over the drawers: one row in inches with fractions, one in millimetres, as a shop's sheet mixes them. */
const CSV = [
  'Part,Qty,Length,Width,Thickness,Material,Grain,Notes',
  'Cubby shelf,2,23 1/2,11 1/4,3/4,Baltic birch,along,Front edge banded',
  'Cubby divider,3,280 mm,286 mm,18 mm,Baltic birch,along,',
  'Top,1,"24 3/8""",12 1/2,3/4,Baltic birch,along,',
].join('\n');

const statusOf = (page: Page) => page.getByTestId('job-status');

/** "$1,234.56" → 123456 cents. */
const cents = (text: string) => {
  const m = /\$([\d,]+)\.(\d\d)/.exec(text);
  if (!m) throw new Error(`No dollar amount in "${text}"`);
  return Number(m[1].replace(/,/g, '')) * 100 + Number(m[2]);
};

/** The phone never scrolls sideways. */
async function noSidewaysScroll(page: Page, where: string) {
  expect(await pageOverflow(page), `${where} scrolls sideways at ${page.viewportSize()?.width} px`).toBeNull();
}

test('the shop’s day with the defaults: job → drawer schedule → CSV → Nest → bench → takeoff → release → the cutter on a phone → a re-cut, the owner watching', async ({
  browser,
}) => {
  test.setTimeout(300_000);
  const stamp = Date.now();
  const jobName = `Larkspur entry cubbies ${stamp}`;

  // The estimator at the desk.
  const estimator = await browser.newPage({ viewport: DESK });
  await signIn(estimator, 'estimator');
  await estimator.goto('/jobs');
  await estimator.getByRole('button', { name: 'New job' }).click();
  const form = estimator.getByRole('form', { name: 'New job' });
  await form.getByLabel('Job name').fill(jobName);
  await form.getByLabel('Customer').fill('Ashby household');
  await form.getByRole('button', { name: 'Create job' }).click();
  await expect(estimator.getByRole('heading', { level: 1, name: jobName })).toBeVisible();
  const jobId = estimator.url().split('/').pop()!;
  await expect(statusOf(estimator)).toHaveText('Quoting');
  await shot(estimator, 'day-01-job-created');

  // The owner looks in: a new job, still being quoted.
  const owner = await browser.newPage({ viewport: TABLET });
  await signIn(owner, 'owner');
  await owner.goto(`/jobs/${jobId}`);
  await expect(statusOf(owner)).toHaveText('Quoting');

  // A drawer schedule with everything the form offers left as it is: only the label, the count and the opening.
  const sections = estimator.getByRole('navigation', { name: 'Job sections' });
  await sections.getByRole('link', { name: 'Drawer schedules' }).click();
  await estimator.getByRole('button', { name: 'New drawer schedule' }).click();
  await estimator.getByLabel('Label').fill('Entry drawers');
  await estimator.getByLabel('Boxes').fill('3');
  await estimator.getByLabel('Opening width').fill('15 3/4');
  await estimator.getByLabel('Opening height').fill('6');
  await estimator.getByLabel('Opening depth').fill('18');
  await estimator.getByLabel('Opening depth').blur();
  // The defaults are the stock room's Baltic birch, named by its nominal and its actual thickness.
  for (const label of ['Front and back thickness', 'Side thickness', 'Bottom thickness']) {
    await expect(estimator.getByLabel(label, { exact: true }).locator('option:checked')).toContainText(/sheet · \d+ mm actual/);
  }
  await expect(estimator.locator('main').getByRole('alert'), 'no stock warning with the defaults').toHaveCount(0);
  const scheduleParts = estimator.getByRole('table', { name: 'Parts of this schedule' }).getByRole('row');
  await expect(scheduleParts).toHaveCount(5);
  await shot(estimator, 'day-02-drawer-schedule');
  await estimator.getByRole('button', { name: 'Add to the cut list' }).click();
  await expect(estimator.getByText('4 rows in the cut list')).toBeVisible();

  // The cubbies come from a spreadsheet.
  await sections.getByRole('link', { name: 'Cut list' }).click();
  await estimator.getByRole('button', { name: 'Upload CSV or Excel' }).click();
  await estimator.getByLabel('File').setInputFiles({ name: 'cubbies.csv', mimeType: 'text/csv', buffer: Buffer.from(CSV) });
  await shot(estimator, 'day-03-upload-preview');
  await estimator.getByRole('button', { name: 'Import 3 rows' }).click();
  const rows = estimator.getByTestId('cut-list-row');
  await expect(rows).toHaveCount(7);
  // Fractions read as inches, millimetres as millimetres, and a typed ¾″ is the 18 mm sheet it means.
  await expect(estimator.getByRole('row', { name: /^5 Cubby shelf 2 23-1\/2″ 11-1\/4″ 18 mm Baltic birch/ })).toHaveCount(1);
  await expect(estimator.getByRole('row', { name: /^6 Cubby divider 3 ≈11″ ≈11-1\/4″ 18 mm Baltic birch/ })).toHaveCount(1);
  await expect(estimator.getByRole('row', { name: /^7 Top 1 24-3\/8″ 12-1\/2″ 18 mm Baltic birch/ })).toHaveCount(1);
  await shot(estimator, 'day-04-cut-list');

  // Nest with the panel's own settings: every part lands on the stock room's sheets.
  await sections.getByRole('link', { name: 'Plan' }).click();
  const nestButton = estimator.getByRole('button', { name: /^Nest \d+ parts$/ });
  const partCount = Number(/\d+/.exec((await nestButton.textContent()) ?? '')![0]);
  expect(partCount, 'three boxes of four parts and a bottom, and six cubby parts').toBe(3 * 5 + 6);
  await nestButton.click();
  const summary = estimator.getByTestId('plan-summary');
  await expect(summary).toBeVisible({ timeout: 90_000 });
  await expect(summary.getByRole('table', { name: 'Parts not placed' })).toHaveCount(0);
  await shot(estimator, 'day-05-nested');
  await estimator.getByLabel('Plan name').fill('Entry cubbies and drawers');
  await estimator.getByRole('button', { name: 'Save as draft plan' }).click();
  await expect(estimator.getByTestId('bench-status')).toContainText('straight through-cuts');
  const planId = estimator.url().split('/').pop()!;
  const nested = await savedPlan(estimator, planId);
  const placed = nested.pieces.reduce((n, p) => n + p.placements.length, 0);
  expect(placed, 'every part is on a sheet').toBe(partCount);
  expect(new Set(nested.pieces.map((p) => `${p.material} ${p.thickness}`))).toEqual(
    new Set(['Baltic birch 18', 'Baltic birch 12', 'Baltic birch 6']),
  );

  // A part dragged into an offcut on the bench, and saved.
  const move = pickMove(nested.pieces);
  expect(move, 'the plan has an offcut a part fits in').not.toBeNull();
  await dragPart(estimator, nested.pieces, move!.piece, move!.part, move!.to.x, move!.to.y);
  await expect(estimator.getByTestId('bench-status')).toContainText('straight through-cuts');
  await estimator.getByRole('button', { name: 'Save layout' }).click();
  await expect(estimator.getByText('Saved. The saw order was rebuilt')).toBeVisible();
  await shot(estimator, 'day-06-bench-saved');
  const moved = await savedPlan(estimator, planId);
  const after = moved.pieces[move!.piece].placements.find((p) => p.partId === move!.part.partId && p.instance === move!.part.instance);
  expect(after, 'the dragged part is still on its piece').toBeDefined();
  expect([after!.x, after!.y], 'the dragged part moved').not.toEqual([move!.part.x, move!.part.y]);

  // The takeoff: the allowance costs no more than the percentage it states.
  await sections.getByRole('link', { name: 'Takeoff' }).click();
  await expect(estimator.getByRole('heading', { name: /Takeoff for “Entry cubbies and drawers”/ })).toBeVisible();
  const withLabel = (await estimator.getByTestId('takeoff-total-allowance').textContent()) ?? '';
  const percent = Number(/With the (\d+(?:\.\d+)?) % allowance/.exec(withLabel)?.[1]);
  expect(percent, 'the shop’s default allowance').toBeGreaterThan(0);
  const cost = cents((await estimator.getByText('Material cost').locator('..').textContent()) ?? '');
  const withAllowance = cents(withLabel);
  expect(cost).toBeGreaterThan(0);
  expect(withAllowance).toBeGreaterThan(cost);
  // Taken once per material and rounded to the cent per material: at most a cent a material over the exact share.
  expect(withAllowance - cost).toBeLessThanOrEqual(Math.ceil((cost * percent) / 100) + 3);
  expect(withAllowance - cost).toBeGreaterThanOrEqual(Math.floor((cost * percent) / 100) - 3);
  await expect(estimator.getByTestId('takeoff-covered')).toHaveText(/Can cover it now/);
  await shot(estimator, 'day-07-takeoff');

  // Release from the takeoff: the job is being cut, and the owner sees it.
  await estimator.getByRole('button', { name: 'Release plan to the saw' }).click();
  const confirm = estimator.getByRole('dialog');
  if (await confirm.isVisible().catch(() => false)) await confirm.getByRole('button', { name: /Release/ }).click();
  await expect(estimator.getByRole('button', { name: 'Release plan to the saw' })).toHaveCount(0);
  await owner.reload();
  await expect(statusOf(owner)).toHaveText('Cutting');
  await shot(owner, 'day-08-owner-cutting-tablet');

  // The cutter, one hand on the phone at the saw.
  const cutter = await browser.newPage({ viewport: PHONE, hasTouch: true, isMobile: true });
  await signIn(cutter, 'cutter');
  await cutter.goto('/shop-floor');
  await noSidewaysScroll(cutter, 'The shop floor');
  await shot(cutter, 'day-09-floor-phone');
  await cutter.getByTestId('queue-plan').filter({ hasText: 'Entry cubbies and drawers' }).filter({ hasText: jobName }).click();
  let ticks = 0;
  for (let i = 0; i < 400; i++) {
    const finish = cutter.getByRole('link', { name: 'Finish the plan' });
    if (await finish.isVisible()) break;
    const done = cutter.getByRole('button', { name: /^Done — cut \d+$/ });
    if (await done.isVisible()) {
      if (ticks === 0) {
        await noSidewaysScroll(cutter, 'The cutting view');
        await shot(cutter, 'day-10-cutting-phone');
      }
      await Promise.all([cutter.waitForResponse((r) => r.url().includes('/steps') && r.request().method() === 'POST'), done.tap()]);
      ticks++;
      continue;
    }
    await cutter.getByRole('navigation', { name: 'Stock pieces' }).getByRole('button').filter({ hasNotText: '✓' }).first().tap();
  }
  const cuts = moved.pieces.length;
  expect(ticks, 'at least one cut a piece').toBeGreaterThanOrEqual(cuts);
  await noSidewaysScroll(cutter, 'The last cut');
  await cutter.getByRole('link', { name: 'Finish the plan' }).tap();
  await expect(cutter.getByRole('heading', { name: 'Finish: Entry cubbies and drawers' })).toBeVisible();
  await noSidewaysScroll(cutter, 'The finish form');
  await cutter.getByLabel('Rack location for offcuts').fill('Offcut shelf 2');
  await cutter.getByRole('checkbox', { name: /^Cubby shelf #1\b/ }).check();
  await cutter.getByLabel('What happened to Cubby shelf #1').fill('Chipped the face on the crosscut');
  await shot(cutter, 'day-11-finish-phone');
  await cutter.getByRole('button', { name: 'Mark the plan done' }).tap();
  const result = cutter.getByTestId('finish-result');
  await expect(result.getByTestId('finish-recuts')).toHaveText('1 damaged part on the job’s re-cut list.');
  await expect(result).not.toContainText('$');
  await noSidewaysScroll(cutter, 'The finish result');
  await shot(cutter, 'day-12-finished-phone');

  // The damaged shelf is on the re-cut list, at its size.
  await cutter.getByRole('link', { name: 'See the re-cut list' }).tap();
  const recuts = cutter.getByRole('table', { name: 'Re-cuts' }).getByTestId('recut');
  await expect(recuts).toHaveCount(1);
  await expect(recuts.first()).toContainText('Cubby shelf #1');
  await expect(recuts.first()).toContainText('23-1/2″ × 11-1/4″');
  await expect(recuts.first()).toContainText('Chipped the face on the crosscut');
  await noSidewaysScroll(cutter, 'The re-cut list');
  await shot(cutter, 'day-13-recut-list-phone');

  // The owner: the plan is cut, the job still cutting while a re-cut is open, and the jobs list agrees.
  await owner.goto(`/jobs/${jobId}/plan`);
  await expect(statusOf(owner)).toHaveText('Cutting');
  await expect(owner.getByTestId('recut-summary')).toHaveText('1 to re-cut');
  await shot(owner, 'day-14-owner-recut-tablet');
  await owner.goto(`/jobs?q=${encodeURIComponent(jobName)}`);
  const row = owner.getByRole('table', { name: 'Jobs' }).getByRole('row').filter({ hasText: jobName });
  await expect(row).toContainText('Cutting');
  await expect(row.getByRole('cell', { name: String(partCount), exact: true }), 'the jobs list counts every part').toHaveCount(1);
  await shot(owner, 'day-15-owner-jobs-tablet');
});

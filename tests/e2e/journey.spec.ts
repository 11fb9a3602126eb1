/**
 * The estimator's whole day on one new job, as issue 5 lays it out: create the job → add a drawer schedule →
 * upload a CSV → nest with progress → drag a part on the bench and save → release → open the saw order → download
 * the PDF.
 */
import fs from 'node:fs';
import { expect, test, type Page } from './support/test';
import { dragPart, pickMove, savedPlan } from './support/bench';
import { shot, signIn } from './support/session';
import { pdfInfo } from '../support/pdf-read';

const CSV = [
  'Part,Qty,Length,Width,Thickness,Material,Grain,Notes',
  'Bench seat,1,48,16,3/4,Maple ply,along,Round the front edge',
  'Bench side,2,18,16,3/4,Maple ply,along,',
  'Cubby divider,3,15,14,3/4,Maple ply,any,',
].join('\n');

/** A thickness typed as the estimator writes it: the picker lists the stock room's thicknesses, or takes another typed. */
async function typeThickness(page: Page, label: string, text: string) {
  const field = page.getByLabel(label, { exact: true });
  if ((await field.evaluate((el) => el.tagName)) === 'SELECT') {
    await field.selectOption({ label: 'Another thickness…' });
    const typed = page.getByLabel(`${label}, typed`);
    await typed.fill(text);
    await typed.blur();
  } else {
    await field.fill(text);
    await field.blur();
  }
}

test('an estimator takes a new job from drawer schedule and upload to a released plan and its saw order PDF', async ({ page }) => {
  test.setTimeout(180_000);
  await signIn(page, 'estimator');
  await page.goto('/jobs');
  await expect(page.getByRole('table', { name: 'Jobs' })).toBeVisible();
  await page.getByRole('button', { name: 'New job' }).click();
  const form = page.getByRole('form', { name: 'New job' });
  const name = `Brookside mudroom bench ${Date.now()}`;
  await form.getByLabel('Job name').fill(name);
  await form.getByLabel('Customer').fill('Ferreira family');
  await form.getByRole('button', { name: 'Create job' }).click();
  await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();
  const sections = page.getByRole('navigation', { name: 'Job sections' });

  // Two drawers under the bench, in the stock the rack holds (18 and 12 mm birch, 6 mm maple ply bottoms).
  await sections.getByRole('link', { name: 'Drawer schedules' }).click();
  await page.getByRole('button', { name: 'New drawer schedule' }).click();
  await page.getByLabel('Label').fill('Bench drawers');
  await page.getByLabel('Boxes').fill('2');
  await page.getByLabel('Opening width').fill('15');
  await page.getByLabel('Opening height').fill('5 1/2');
  await page.getByLabel('Opening depth').fill('21');
  await typeThickness(page, 'Front and back thickness', '18 mm');
  await typeThickness(page, 'Side thickness', '12 mm');
  await typeThickness(page, 'Bottom thickness', '6 mm');
  await page.getByLabel('Bottom material').fill('Maple ply');
  await page.getByLabel('Bottom material').blur();
  await expect(page.getByRole('table', { name: 'Parts of this schedule' }).getByRole('row')).toHaveCount(5);
  await page.getByRole('button', { name: 'Add to the cut list' }).click();
  await expect(page.getByText('4 rows in the cut list')).toBeVisible();
  await shot(page, 'journey-1-drawer-schedule');

  await sections.getByRole('link', { name: 'Cut list' }).click();
  await page.getByRole('button', { name: 'Upload CSV or Excel' }).click();
  await page.getByLabel('File').setInputFiles({ name: 'bench.csv', mimeType: 'text/csv', buffer: Buffer.from(CSV) });
  await page.getByRole('button', { name: 'Import 3 rows' }).click();
  await expect(page.getByTestId('cut-list-row')).toHaveCount(7);
  await shot(page, 'journey-2-cut-list');

  await sections.getByRole('link', { name: 'Plan' }).click();
  await page.getByLabel('Search for (seconds)').fill('2');
  await page.getByRole('button', { name: /^Nest \d+ parts?$/ }).click();
  await expect(page.getByTestId('nest-progress')).toBeVisible();
  await expect(page.getByTestId('plan-summary')).toBeVisible({ timeout: 30_000 });
  await shot(page, 'journey-3-nested');
  await page.getByLabel('Plan name').fill('Bench and drawers');
  await page.getByRole('button', { name: 'Save as draft plan' }).click();
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');
  const planId = page.url().split('/').pop()!;

  const before = await savedPlan(page, planId);
  const move = pickMove(before.pieces);
  expect(move, 'the nested plan has an offcut a part fits in').not.toBeNull();
  await dragPart(page, before.pieces, move!.piece, move!.part, move!.to.x, move!.to.y);
  await expect(page.getByTestId('bench-status')).toContainText('straight through-cuts');
  await page.getByRole('button', { name: 'Save layout' }).click();
  await expect(page.getByText('Saved. The saw order was rebuilt')).toBeVisible();
  await shot(page, 'journey-4-bench-saved');

  await page.getByRole('button', { name: 'Release plan to the saw' }).click();
  await page.getByRole('link', { name: 'Saw order' }).click();
  await expect(page.getByRole('heading', { level: 1, name: /Saw order/ })).toBeVisible();
  const { pieces } = await savedPlan(page, planId);
  await expect(page.getByTestId('saw-order-piece')).toHaveCount(pieces.length);
  await shot(page, 'journey-5-saw-order');

  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Download PDF' }).click()]);
  const pdf = pdfInfo(fs.readFileSync(await download.path()));
  expect(pdf.pages.length).toBeGreaterThanOrEqual(pieces.length);
});

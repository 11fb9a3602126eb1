import fs from 'node:fs';
import { expect, test } from './support/test';
import Papa from 'papaparse';
import { shot, signIn } from './support/session';

const CSV = [
  'Part,Qty,Length,Width,Thickness,Material,Grain,Notes',
  'Vanity side,2,30,21,3/4,Maple ply,along,Edge band front',
  'Shelf,two,29,20,3/4,Maple ply,any,',
  'Stretcher,2,29-1/4,4,3/4,Maple ply,,',
].join('\n');

test('an estimator builds a cut list by keyboard, upload and drawer schedule, then exports it', async ({ page }) => {
  test.setTimeout(120_000);
  await signIn(page, 'estimator');
  await page.goto('/jobs');
  const jobs = page.getByRole('table', { name: 'Jobs' });
  await expect(jobs).toBeVisible();
  // The jobs list sorts by any column, and the sort is kept in the URL.
  await jobs.getByRole('button', { name: /^Due/ }).click();
  await expect(page).toHaveURL(/sort=due\.asc/);
  await expect(jobs.getByRole('row').nth(1)).toContainText('Hollis kitchen');
  await shot(page, 'cut-list-01-jobs');
  await page.getByRole('link', { name: 'Arden Books wall units' }).click();
  await expect(page.getByRole('heading', { level: 2, name: 'Cut list' })).toBeVisible();
  const table = page.getByRole('table', { name: 'Cut list' });
  const rows = table.getByTestId('cut-list-row');
  const before = await rows.count();

  // Two rows typed with the keyboard only: Tab between cells, Enter adds the row.
  await page.getByLabel('New part: Part').click();
  await page.keyboard.type('Toe kick');
  for (const value of ['1', '30 1/2', '4', '3/4', 'MDF']) {
    await page.keyboard.press('Tab');
    await page.keyboard.type(value);
  }
  await page.keyboard.press('Enter');
  await expect(rows).toHaveCount(before + 1);
  await expect(page.getByLabel('New part: Part')).toBeFocused();
  await page.keyboard.type('Filler strip');
  await page.keyboard.press('Tab');
  await page.keyboard.type('2');
  await page.keyboard.press('Tab');
  await page.keyboard.type('30');
  await page.keyboard.press('Tab');
  await page.keyboard.type('3 1/2');
  await page.keyboard.press('Enter'); // thickness and material carried over from the row before
  await expect(rows).toHaveCount(before + 2);
  await expect(rows.last().getByLabel(/^Length, row/)).toHaveValue('30″');
  await expect(rows.last().getByLabel(/^Width, row/)).toHaveValue('3-1/2″');

  // Arrows move like a spreadsheet: up to the row above, right to its quantity; Enter saves and moves down.
  await page.getByLabel('New part: Part').focus();
  await page.keyboard.press('ArrowUp');
  await page.keyboard.press('ArrowRight');
  await page.keyboard.type('3');
  await page.keyboard.press('Enter');
  await expect(rows.last().getByLabel(/^Qty, row/)).toHaveValue('3');
  // A length the parser refuses shows on its cell and is not saved.
  const width = rows.last().getByLabel(/^Width, row/);
  await width.fill('three and a half');
  await width.press('Enter');
  await expect(width).toHaveAttribute('aria-invalid', 'true');
  await expect(rows.last().getByRole('alert')).toBeVisible();
  await shot(page, 'cut-list-02-typed-rows');
  await width.fill('3 1/2');
  await width.press('Enter');
  await expect(width).not.toHaveAttribute('aria-invalid');

  // Upload: the bad row is listed with its reason; nothing is written until the valid rows are imported.
  await page.getByRole('button', { name: 'Upload CSV or Excel' }).click();
  await page.getByLabel('File').setInputFiles({ name: 'vanity.csv', mimeType: 'text/csv', buffer: Buffer.from(CSV) });
  const problems = page.getByRole('list', { name: 'Rows with problems' });
  await expect(problems).toContainText('Row 3: Quantity “two” is not a whole number.');
  await expect(page.getByLabel('Bare numbers are')).toHaveValue('in');
  await expect(rows).toHaveCount(before + 2);
  await shot(page, 'cut-list-03-upload-preview');
  await page.getByRole('button', { name: 'Import only the 2 valid rows' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Imported 2 rows' })).toContainText('Left out row 3, which has a problem.');
  await expect(rows).toHaveCount(before + 4);
  await shot(page, 'cut-list-04-imported');

  // A drawer schedule puts its parts in the cut list.
  await page.getByRole('navigation', { name: 'Job sections' }).getByRole('link', { name: 'Drawer schedules' }).click();
  await page.getByRole('button', { name: 'New drawer schedule' }).click();
  await page.getByLabel('Label').fill('Desk drawers');
  await page.getByLabel('Boxes').fill('2');
  await page.getByLabel('Opening width').fill('15');
  await page.getByLabel('Opening height').fill('5 1/2');
  await page.getByLabel('Opening depth').fill('21');
  await page.getByLabel('Opening depth').blur();
  const preview = page.getByRole('table', { name: 'Parts of this schedule' });
  await expect(preview.getByRole('row')).toHaveCount(5);
  await expect(page.getByRole('complementary', { name: 'Router table cautions' })).toBeVisible();
  await shot(page, 'cut-list-05-drawer-schedule-form');
  await page.getByRole('button', { name: 'Add to the cut list' }).click();
  await expect(page.getByText('4 rows in the cut list')).toBeVisible();
  await shot(page, 'cut-list-06-drawer-schedules');

  await page.getByRole('navigation', { name: 'Job sections' }).getByRole('link', { name: 'Cut list' }).click();
  await expect(rows).toHaveCount(before + 8);
  const side = rows.filter({ hasText: 'Desk drawers · side' });
  await expect(side).toHaveCount(1);
  await expect(side.getByText('drawer schedule')).toBeVisible();
  await expect(side.getByRole('textbox', { name: /^Length/ })).toHaveCount(0); // sizes are the schedule's
  await shot(page, 'cut-list-07-with-schedule');

  // Export.
  const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: 'Export CSV' }).click()]);
  expect(download.suggestedFilename()).toBe('arden-books-wall-units-cut-list.csv');
  const csv = Papa.parse<string[]>(
    fs
      .readFileSync((await download.path())!, 'utf8')
      .replace(/^\uFEFF/, '')
      .trim(),
  ).data;
  expect(csv[0]).toEqual([
    'Part',
    'Quantity',
    'Length (in)',
    'Width (in)',
    'Thickness (in)',
    'Material',
    'Grain',
    'Joint allowance (in)',
    'Notes',
    'Drawer schedule',
  ]);
  // 3/4 MDF was typed; the shop's 3/4″ MDF is 18 mm, written in the column's inches (18 / 25.4 = 0.7087″, NIST).
  expect(csv.find((r) => r[0] === 'Toe kick')).toEqual(['Toe kick', '1', '30-1/2"', '4"', '0.7087"', 'MDF', 'along', '', '', '']);
  // Lock rabbet on the default 18 mm front: face left = 9 mm − ⅛″ = 0.2293″, so a 20″ box's side is
  // 20 − 2 × 0.2293 = 19.5413″ (off the 1/32″ grid, so written in decimal inches).
  expect(csv.find((r) => r[0] === 'Desk drawers · side')?.slice(1, 3)).toEqual(['4', '19.5413"']);
});

test('a cutter sees the cut list read-only and can open the setup cards', async ({ page }) => {
  await signIn(page, 'cutter');
  await page.goto('/jobs?q=Hollis%20kitchen');
  await page.getByRole('link', { name: 'Hollis kitchen' }).click();
  await expect(page.getByRole('table', { name: 'Cut list' })).toBeVisible();
  await expect(page.getByLabel('New part: Part')).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Upload CSV or Excel' })).toHaveCount(0);
  await shot(page, 'cut-list-08-cutter');
  await page
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: /^Setup cards/ })
    .click();
  await expect(page.getByRole('heading', { level: 1, name: 'Setup cards' })).toBeVisible();
  await expect(page.getByRole('complementary', { name: 'Router table cautions' })).toBeVisible();
  await shot(page, 'cut-list-09-setup-cards');
});

test('an Excel workbook is read in the browser, its unit detected, and imported whole', async ({ page }) => {
  await signIn(page, 'estimator');
  await page.goto('/jobs?q=Pemberton%20vanity');
  await page.getByRole('link', { name: 'Pemberton vanity' }).click();
  const rows = page.getByRole('table', { name: 'Cut list' }).getByTestId('cut-list-row');
  const before = await rows.count();
  await page.getByRole('button', { name: 'Upload CSV or Excel' }).click();
  await page.getByLabel('File').setInputFiles('lib/cut-list/fixtures/vanity-metric.xlsx');
  await expect(page.getByLabel('Bare numbers are')).toHaveValue('mm');
  await expect(page.getByText('3 rows', { exact: true })).toBeVisible();
  await shot(page, 'cut-list-10-xlsx-preview');
  await page.getByRole('button', { name: 'Import 3 rows' }).click();
  await expect(rows).toHaveCount(before + 3);
  // The formula-looking note is kept as text.
  await expect(rows.last().getByLabel(/^Part, row/)).toHaveValue('Top rail');
  await expect(rows.last().getByLabel(/^Notes, row/)).toHaveValue('=1+1');
  await shot(page, 'cut-list-11-xlsx-imported');
});

test('a deleted row comes back where it was, with Undo or Ctrl+Z', async ({ page }) => {
  await signIn(page, 'estimator');
  await page.goto('/jobs');
  await page.getByRole('button', { name: 'New job' }).click();
  await page.getByLabel('Job name').fill('Undo check cabinet');
  await page.getByRole('button', { name: 'Create job' }).click();
  await expect(page.getByRole('heading', { level: 2, name: 'Cut list' })).toBeVisible();
  const rows = page.getByRole('table', { name: 'Cut list' }).getByTestId('cut-list-row');
  for (const name of ['Top', 'Bottom', 'Shelf']) {
    await page.getByLabel('New part: Part').fill(name);
    for (const [label, value] of [
      ['Length', '30'],
      ['Width', '12'],
      ['Thickness', '3/4'],
      ['Material', 'Maple ply'],
    ])
      await page.getByLabel(`New part: ${label}`).fill(value);
    await page.getByLabel('New part: Part').press('Enter');
  }
  await expect(rows).toHaveCount(3);
  const names = () => rows.getByLabel(/^Part, row/).evaluateAll((inputs) => inputs.map((i) => (i as HTMLInputElement).value));

  await page.getByRole('button', { name: 'Delete row 2' }).click();
  await expect(rows).toHaveCount(2);
  const undo = page.getByTestId('cut-list-undo');
  await expect(undo).toContainText('Deleted row 2, “Bottom”.');
  await shot(page, 'cut-list-12-deleted-row');
  await undo.getByRole('button', { name: 'Undo' }).click();
  await expect(rows).toHaveCount(3);
  await expect.poll(names).toEqual(['Top', 'Bottom', 'Shelf']);
  await expect(undo).toHaveCount(0);

  // The keyboard: Ctrl+Z outside a cell being typed in takes the last delete back.
  await page.getByRole('button', { name: 'Delete row 1' }).click();
  await expect(rows).toHaveCount(2);
  await page.keyboard.press('Control+z');
  await expect(rows).toHaveCount(3);
  await expect.poll(names).toEqual(['Top', 'Bottom', 'Shelf']);
  // It was saved: a reload shows the same rows.
  await page.reload();
  await expect.poll(names).toEqual(['Top', 'Bottom', 'Shelf']);
});

import { expect, test } from './support/test';
import { shot, signIn } from './support/session';

test('the owner edits a size’s location and cost, sees them in the table and the change in its history; an estimator sees no Edit action', async ({
  page,
  browser,
}) => {
  await signIn(page, 'owner');
  // A size of this spec's own, so the seeded sizes other specs count on stay as they were.
  const material = `Sapele ${Date.now().toString(36)}`;
  const created = await page.request.post('/api/stock', {
    data: {
      kind: 'board',
      material,
      nominalThickness: '4/4',
      thickness: 21,
      length: 2438,
      width: 165,
      onHand: 6,
      costCents: 1150,
      supplier: 'Millbrook Hardwoods',
      location: 'Lumber rack 5',
      surfacing: 'S2S',
    },
  });
  expect(created.status()).toBe(201);

  await page.goto('/stock');
  const row = page.getByTestId('stock-row').filter({ hasText: material });
  await expect(row).toContainText('$11.50 /bf');
  await row.getByRole('button', { name: /^Edit / }).click();
  const dialog = page.getByRole('dialog', { name: /^Edit Sapele/ });
  await expect(dialog).toBeVisible();
  await expect(dialog.getByLabel('Cost per board foot (USD)')).toHaveValue('11.50');

  await dialog.getByLabel('Cost per board foot (USD)').fill('-3');
  await dialog.getByRole('button', { name: 'Save changes' }).click();
  await expect(dialog.getByText('Enter an amount such as 94.00.')).toBeVisible();

  await dialog.getByLabel('Location').fill('Lumber rack 6');
  await dialog.getByLabel('Cost per board foot (USD)').fill('12.75');
  await shot(page, 'stock-edit-dialog');
  await dialog.getByRole('button', { name: 'Save changes' }).click();
  await expect(dialog).toHaveCount(0);
  await expect(row).toContainText('$12.75 /bf');
  await expect(row).toContainText('Lumber rack 6');
  await expect(row.getByTestId('on-hand')).toHaveText('6');
  await shot(page, 'stock-edit-after');

  await row.getByRole('link', { name: material }).click();
  const change = page.getByTestId('detail-change');
  await expect(change).toHaveCount(1);
  await expect(change).toContainText('Maren Okafor');
  await expect(change).toContainText('Cost $11.50 → $12.75; Location Lumber rack 5 → Lumber rack 6');
  await shot(page, 'stock-edit-history');

  const estimator = await browser.newPage();
  await signIn(estimator, 'estimator');
  await estimator.goto('/stock');
  await expect(estimator.getByTestId('stock-row').filter({ hasText: material })).toContainText('Lumber rack 6');
  await expect(estimator.getByRole('button', { name: /^Edit / })).toHaveCount(0);
  await estimator.close();
});

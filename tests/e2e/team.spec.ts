import { expect, test } from './support/test';
import { shot, signIn } from './support/session';

test('the owner adds a cutter with a first password of their own, who can sign in; after deactivation their next request is refused', async ({
  browser,
}) => {
  const ownerCtx = await browser.newContext();
  const owner = await ownerCtx.newPage();
  await signIn(owner, 'owner');
  await owner.goto('/team');
  const email = `wren.${Date.now()}@larkspur.example`;
  const form = owner.getByRole('form', { name: 'Add a person' });
  await form.getByLabel('Name').fill('Wren Adeyemi');
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Set a first password myself instead').check();
  await form.getByLabel('First password', { exact: true }).fill('saw-dust-2027');
  await form.getByLabel('Role').selectOption('cutter');
  await form.getByRole('button', { name: 'Add to team' }).click();
  await expect(owner.getByRole('cell', { name: email })).toBeVisible();
  await shot(owner, 'owner-team');

  const cutterCtx = await browser.newContext();
  const cutter = await cutterCtx.newPage();
  await cutter.goto('/sign-in');
  await cutter.getByLabel('E-mail').fill(email);
  await cutter.getByLabel('Password').fill('saw-dust-2027');
  await cutter.getByRole('button', { name: 'Sign in' }).click();
  await expect(cutter.getByTestId('signed-in-as')).toHaveText('Wren Adeyemi');
  expect((await cutter.request.get('/api/jobs')).status()).toBe(200);

  const row = owner.getByRole('row').filter({ hasText: email });
  await row.getByRole('button', { name: 'Deactivate' }).click();
  await expect(row.getByText('Deactivated')).toBeVisible();

  expect((await cutter.request.get('/api/jobs')).status()).toBe(401);
  await cutter.goto('/shop-floor');
  await expect(cutter).toHaveURL(/\/sign-in/);
  await ownerCtx.close();
  await cutterCtx.close();
});

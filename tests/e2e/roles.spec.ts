import { expect, test } from '@playwright/test';
import { navFor } from '../../lib/nav';
import { person, shot, signIn, type DemoRole } from './support/session';

const roles: DemoRole[] = ['owner', 'estimator', 'cutter'];

for (const role of roles) {
  test(`the ${role} signs in and sees the ${role}'s navigation, and every page in it opens`, async ({ page }) => {
    await signIn(page, role);
    const nav = page.getByRole('navigation', { name: 'Main' });
    const expected = navFor(role).map((i) => i.label);
    await expect(nav.getByRole('link')).toHaveCount(expected.length);
    for (const label of expected) await expect(nav.getByRole('link', { name: new RegExp(`^${label}`) })).toBeVisible();
    await expect(page.getByTestId('signed-in-role')).toHaveText(role[0].toUpperCase() + role.slice(1));

    for (const item of navFor(role)) {
      await page.goto(item.href);
      await expect(page.getByRole('heading', { level: 1, name: item.label })).toBeVisible();
      await expect(page.getByRole('status').filter({ hasText: /Loading/ })).toHaveCount(0);
      // Next's route announcer is an empty alert region; only alerts with text are errors.
      await expect(page.getByRole('alert').filter({ hasText: /\S/ })).toHaveCount(0);
      await shot(page, `${role}-${item.href.slice(1)}`);
    }
  });
}

test('a cutter is refused an owner page and sees no prices in the stock room', async ({ page }) => {
  await signIn(page, 'cutter');
  await page.goto('/team');
  await expect(page).toHaveURL(/\/no-access/);
  await expect(page.getByRole('heading', { name: 'Not open to your role' })).toBeVisible();
  await shot(page, 'cutter-refused-team');

  const api = await page.request.get('/api/team');
  expect(api.status()).toBe(403);

  await page.goto('/stock');
  await expect(page.getByRole('table', { name: 'Sheets and boards' })).toBeVisible();
  await expect(page.getByRole('columnheader', { name: 'Cost' })).toHaveCount(0);
});

test('a wrong password gets the one generic message and no session', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(person('owner').email);
  await page.getByLabel('Password').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert').filter({ hasText: /\S/ })).toHaveText('That e-mail and password do not match an active account.');
  await shot(page, 'sign-in-refused');
  expect((await page.request.get('/api/jobs')).status()).toBe(401);
});

test('signed-out visitors are sent to sign in', async ({ page }) => {
  await page.goto('/stock');
  await expect(page).toHaveURL(/\/sign-in/);
  await shot(page, 'sign-in');
});

import { navFor } from '../../lib/nav';
import { jobId, saveDraftPlan } from './support/plans';
import { person, shot, signIn, type DemoRole } from './support/session';
import { expect, test } from './support/test';

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

test('a wrong password gets the one generic message and no session', async ({ page, consoleErrors }) => {
  // The browser reports the refused sign-in (401) in its console: that refusal is what this test asks for.
  consoleErrors.allow(/status of 401 .*\/api\/auth\/callback\/credentials/);
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

for (const role of roles) {
  test(`the ${role} sees only the job sections the ${role} may open, and each of them opens`, async ({ page }) => {
    await signIn(page, role);
    await page.goto(`/jobs/${await jobId(page, 'Hollis kitchen')}`);
    const sections = page.getByRole('navigation', { name: 'Job sections' }).getByRole('link');
    const links = await sections.evaluateAll((els) => els.map((e) => ({ label: e.textContent ?? '', href: e.getAttribute('href') ?? '' })));
    expect(links.length).toBeGreaterThanOrEqual(3);
    for (const link of links) {
      await page.goto(link.href);
      await expect(page, `${link.label} opens for the ${role}`).not.toHaveURL(/no-access/);
      await expect(page.getByRole('heading', { name: 'Not open to your role' })).toHaveCount(0);
    }
    // The cutter sees no prices, so no takeoff (it is priced); the others do.
    expect(links.some((l) => l.label === 'Takeoff')).toBe(role !== 'cutter');
  });
}

test('a draft plan is not there for a cutter: every plan page answers 404 like the API and shows nothing of it', async ({
  page,
  browser,
  consoleErrors,
}) => {
  test.setTimeout(90_000);
  await signIn(page, 'estimator');
  const name = `Vanity draft ${Date.now()}`;
  const draftId = await saveDraftPlan(page, 'Pemberton vanity', name);
  const vanity = await jobId(page, 'Pemberton vanity');
  // The estimator, who may edit plans, opens it.
  expect((await page.goto(`/jobs/${vanity}/plan/${draftId}`))?.status()).toBe(200);

  const cutterContext = await browser.newContext();
  const cutter = await cutterContext.newPage();
  await signIn(cutter, 'cutter');
  expect((await cutter.request.get(`/api/plans/${draftId}`)).status()).toBe(404);
  // The browser reports each 404 document in its console; these are the answers this test asks for.
  consoleErrors.allow(/status of 404/);
  for (const path of [
    `/plans/${draftId}/finish`,
    `/plans/${draftId}/saw-order`,
    `/plans/${draftId}/tags`,
    `/shop-floor/${draftId}`,
    `/jobs/${vanity}/plan/${draftId}`,
  ]) {
    const res = await cutter.goto(path);
    expect(res?.status(), path).toBe(404);
    await expect(cutter.locator('body'), path).not.toContainText(name);
  }
  await shot(cutter, 'cutter-draft-404');
  await cutterContext.close();
});

import { expect, test } from './support/test';
import { signIn } from './support/session';

// Regression: while the list was still loading, the jobs table was handed a fresh empty array on every render and
// re-rendered endlessly, so a click on "New job" straight after the page opened froze the tab.
test('"New job" answers a click straight after the jobs page opens, before the list has loaded', async ({ page }) => {
  await signIn(page, 'estimator');
  await page.goto('/jobs');
  await page.getByRole('button', { name: 'New job' }).click({ timeout: 20_000 });
  await expect(page.getByRole('form', { name: 'New job' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Jobs' })).toBeVisible();
});

import { expect, test } from './support/test';
import { startServer, stopServer } from './support/server';
import { shot, signIn } from './support/session';

test('a job created in the browser survives a server restart', async ({ page }) => {
  test.setTimeout(120_000);
  await signIn(page, 'estimator');
  await page.goto('/jobs');
  await expect(page.getByRole('table', { name: 'Jobs' })).toBeVisible();
  await page.getByRole('button', { name: 'New job' }).click();
  const name = `Quarry Lane mudroom ${Date.now()}`;
  const form = page.getByRole('form', { name: 'New job' });
  await form.getByLabel('Job name').fill(name);
  await form.getByLabel('Customer').fill('Okonkwo family');
  await form.getByLabel('Due date').fill('2027-03-15');
  await form.getByRole('button', { name: 'Create job' }).click();
  await expect(page.getByRole('heading', { level: 1, name })).toBeVisible();
  await shot(page, 'job-created');

  // The tab is closed before the restart, so no request of the page's is cut off half-way (the console stays clean).
  await page.goto('about:blank');
  await stopServer();
  await startServer();

  await page.goto('/jobs');
  // The session cookie outlives the restart: the same signed token is still good.
  await expect(page.getByRole('link', { name })).toBeVisible();
  await page.getByLabel('Search').fill('quarry lane');
  await expect(page.getByRole('table', { name: 'Jobs' }).getByRole('row')).toHaveCount(2);
  await shot(page, 'jobs-after-restart');
});

test('an empty job name is refused on the field, and nothing is created', async ({ page, consoleErrors }) => {
  // The browser reports the server's refusal (422) in its console: that refusal is what this test asks for.
  consoleErrors.allow(/status of 422 .*\/api\/jobs\)$/);
  await signIn(page, 'estimator');
  await page.goto('/jobs');
  const before = (await (await page.request.get('/api/jobs?status=all')).json()).total;
  await page.getByRole('button', { name: 'New job' }).click();
  await page.getByRole('button', { name: 'Create job' }).click();
  await expect(page.getByText('Give the job a name.')).toBeVisible();
  expect((await (await page.request.get('/api/jobs?status=all')).json()).total).toBe(before);
});

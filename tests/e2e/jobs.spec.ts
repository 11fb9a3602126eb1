import { expect, test } from './support/test';
import { shot, signIn } from './support/session';
import { pageOverflow } from './support/layout-checks';

// Regression: while the list was still loading, the jobs table was handed a fresh empty array on every render and
// re-rendered endlessly, so a click on "New job" straight after the page opened froze the tab.
test('"New job" answers a click straight after the jobs page opens, before the list has loaded', async ({ page }) => {
  await signIn(page, 'estimator');
  await page.goto('/jobs');
  await page.getByRole('button', { name: 'New job' }).click({ timeout: 20_000 });
  await expect(page.getByRole('form', { name: 'New job' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Jobs' })).toBeVisible();
});

// The list is paged, sorted and searched on the server; the view lives in the URL, so a copied link opens it again.
test('the jobs list pages, sorts and searches on the server, keeps the view in the URL, and fits at 1440, 820 and 390 px', async ({ page }) => {
  test.setTimeout(90_000);
  await signIn(page, 'estimator');
  const tag = `Pager ${Date.now().toString(36)}`;
  for (let i = 1; i <= 30; i++) {
    const res = await page.request.post('/api/jobs', { data: { name: `${tag} cabinet ${String(i).padStart(2, '0')}` } });
    expect(res.status()).toBe(201);
  }
  const jobs = page.getByRole('table', { name: 'Jobs' });
  const bodyRows = jobs.locator('tbody tr');
  for (const width of [1440, 820, 390]) {
    await page.setViewportSize({ width, height: 900 });
    await page.goto(`/jobs?q=${encodeURIComponent(tag)}&sort=name.asc`);
    // Rendered on the server: the first page is in the HTML, 25 rows.
    await expect(bodyRows).toHaveCount(25);
    await expect(bodyRows.first()).toContainText(`${tag} cabinet 01`);
    await expect(page.getByTestId('jobs-range')).toHaveText('1–25 of 30 jobs · page 1 of 2');
    expect(await pageOverflow(page), `no sideways scroll at ${width} px`).toBeNull();
    await shot(page, `jobs-pager-${width}`);

    await page.getByRole('navigation', { name: 'Pages' }).getByRole('link', { name: /Next/ }).click();
    await expect(page).toHaveURL(/page=2/);
    await expect(bodyRows).toHaveCount(5);
    await expect(bodyRows.first()).toContainText(`${tag} cabinet 26`);
    await expect(page.getByTestId('jobs-range')).toHaveText('26–30 of 30 jobs · page 2 of 2');
  }

  // The link keeps the view: opened afresh it shows the same page.
  await page.goto(page.url());
  await expect(bodyRows.first()).toContainText(`${tag} cabinet 26`);
  // Sorting the other way starts again from page 1.
  await jobs.getByRole('button', { name: /^Job/ }).click();
  await expect(page).toHaveURL(/sort=name\.desc/);
  await expect(page).not.toHaveURL(/page=/);
  await expect(bodyRows.first()).toContainText(`${tag} cabinet 30`);
  // A bigger page holds them all; a narrower search finds one.
  await page.getByLabel('Per page').selectOption('50');
  await expect(bodyRows).toHaveCount(30);
  await page.getByLabel('Search').fill(`${tag} cabinet 07`);
  await expect(bodyRows).toHaveCount(1);
  await expect(page.getByTestId('jobs-range')).toHaveText('1–1 of 1 job · page 1 of 1');

  // A link with a page that cannot be says so, with the way back.
  await page.goto('/jobs?page=0');
  await expect(page.getByRole('alert').filter({ hasText: 'does not work' })).toContainText('The page is a whole number, 1 or more.');
  await page.getByRole('link', { name: 'Show the jobs list' }).click();
  await expect(jobs).toBeVisible();
});

import fs from 'node:fs';
import { expect, test, type Page } from './support/test';
import { pageOverflow } from './support/layout-checks';
import { shot, signIn } from './support/session';
import { jobId as jobIdByName } from './support/plans';

const WIDTHS = [1440, 820, 390] as const;

async function kitchenId(page: Page) {
  return jobIdByName(page, 'Hollis kitchen');
}

test('the estimator builds a quote from the demo kitchen’s nested plan with the defaults, reads the customer’s copy, downloads the PDF and marks it sent', async ({
  page,
}) => {
  await signIn(page, 'estimator');
  const jobId = await kitchenId(page);
  await page.goto(`/jobs/${jobId}`);
  await page.getByRole('navigation', { name: 'Job sections' }).getByRole('link', { name: 'Quotes' }).click();
  await expect(page.getByRole('form', { name: 'New quote' })).toBeVisible();
  await page.getByRole('button', { name: 'Build a quote' }).click();
  await expect(page.getByRole('heading', { level: 2, name: /^Q-\d{4} rev A/ })).toBeVisible();

  const lines = page.getByTestId('quote-line');
  const descriptions = () => lines.getByLabel(/description$/).evaluateAll((els) => els.map((e) => (e as HTMLTextAreaElement).value));
  // The demo plan's sheets at cost (¾″ as on screen), the spoilage allowance once, and saw time with its hours.
  await expect(lines.first().getByLabel(/description$/)).toHaveValue(/^Maple ply ¾″, /);
  const described = await descriptions();
  expect(
    described.some((d) => /^Maple ply ¾″, 96″ × 48″ \(/.test(d)),
    described.join(' | '),
  ).toBe(true);
  expect(described.filter((d) => d.startsWith('Spoilage allowance'))).toHaveLength(1);
  expect(described.filter((d) => /^Saw time: \d+ cuts, \d+ stock pieces? handled$/.test(d))).toHaveLength(1);
  await expect(page.getByRole('region', { name: 'Totals' })).toContainText('Margin');
  await expect(page.getByRole('region', { name: 'Totals' })).toContainText('Labour hours');
  for (const width of WIDTHS) {
    await page.setViewportSize({ width, height: 900 });
    expect(await pageOverflow(page), `sideways scroll at ${width}`).toBeNull();
    await shot(page, `quotes-01-estimator-${width}`);
  }
  await page.setViewportSize({ width: 1440, height: 900 });

  // A line of the estimator's own: delivery, 1 × 85.00, untaxed.
  await page.getByLabel('Add a line').selectOption('other');
  const added = lines.last();
  await added.getByLabel(/description/).fill('Delivery and install');
  await added.getByLabel(/unit cost/).fill('85.00');
  await page.getByRole('button', { name: 'Save draft' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Saved.' })).toBeVisible();

  // The customer's copy: prices, total and deposit, never cost, margin or hours.
  await page.getByRole('button', { name: 'Customer’s copy' }).click();
  const copy = page.getByRole('article', { name: 'The customer’s copy' });
  await expect(copy).toContainText('Delivery and install');
  await expect(copy).toContainText('Maple ply ¾″');
  await expect(copy).toContainText('Deposit on acceptance (50 %)');
  await expect(copy).not.toContainText('Margin');
  await expect(copy).not.toContainText('Cost');
  for (const width of WIDTHS) {
    await page.setViewportSize({ width, height: 900 });
    expect(await pageOverflow(page), `sideways scroll at ${width}`).toBeNull();
    await shot(page, `quotes-02-customer-copy-${width}`);
  }
  await page.setViewportSize({ width: 1440, height: 900 });

  const download = page.waitForEvent('download');
  await page.getByRole('link', { name: 'Download PDF' }).click();
  const file = await (await download).path();
  const bytes = fs.readFileSync(file);
  expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
  fs.mkdirSync('test-results/pdf', { recursive: true });
  fs.copyFileSync(file, `test-results/pdf/quote-${process.env.E2E_PORT ?? 'e2e'}.pdf`);

  page.once('dialog', (d) => d.accept());
  await page.getByRole('button', { name: 'Send to Priya & Sam Hollis' }).click();
  await expect(page.getByRole('heading', { level: 2, name: /rev A/ })).toContainText('Sent');
  await expect(page.getByRole('button', { name: 'New revision' })).toBeVisible();
  await shot(page, 'quotes-03-sent-1440');

  // The customer's page lists the quote; the settings page shows the pricing the quote started from.
  await page.goto('/customers');
  await page.getByRole('link', { name: 'Priya & Sam Hollis' }).click();
  await expect(page.getByRole('table', { name: 'The customer’s quotes' })).toContainText(/Q-\d{4} rev A/);
  for (const width of WIDTHS) {
    await page.setViewportSize({ width, height: 900 });
    expect(await pageOverflow(page), `sideways scroll at ${width}`).toBeNull();
    await shot(page, `quotes-04-customer-${width}`);
  }
});

test('the owner sees the pricing settings and the demo’s hardware price list', async ({ page }) => {
  await signIn(page, 'owner');
  await page.goto('/settings');
  await expect(page.getByRole('form', { name: 'Pricing' })).toBeVisible();
  await expect(page.getByLabel('Deposit on acceptance (%)')).toHaveValue('50');
  await expect(page.getByRole('table', { name: 'Hardware price list' })).toContainText('Side-mount slides, 18″, full extension');
  for (const width of WIDTHS) {
    await page.setViewportSize({ width, height: 900 });
    expect(await pageOverflow(page), `sideways scroll at ${width}`).toBeNull();
    await shot(page, `quotes-05-pricing-${width}`);
  }
});

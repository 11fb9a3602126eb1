import { pageOverflow } from './support/layout-checks';
import { saveDraftPlan } from './support/plans';
import { shot, signIn } from './support/session';
import { expect, test, type Page } from './support/test';
import { mailFor } from './support/mail';

const WIDTHS = [1440, 820, 390] as const;

/** A job of its own for a new customer with an e-mail address, with a small cut list in the demo's ¾″ Baltic birch. */
async function jobForNewCustomer(page: Page, name: string, email: string) {
  const customer = await page.request.post('/api/customers', {
    data: {
      name: 'Ruth Calloway',
      email,
      phone: '(555) 014-3300',
      billingAddress: '9 Fenwick Road, Millbrook',
      siteAddress: '',
      company: '',
      notes: '',
    },
  });
  expect(customer.status(), await customer.text()).toBe(201);
  const job = await page.request.post('/api/jobs', { data: { name, customer: { id: (await customer.json()).id } } });
  expect(job.status(), await job.text()).toBe(201);
  const id: string = (await job.json()).id;
  for (const part of [
    { label: 'Side', quantity: 2, length: 610, width: 406, thickness: 18, material: 'Baltic birch' },
    { label: 'Shelf', quantity: 3, length: 762, width: 381, thickness: 18, material: 'Baltic birch' },
  ])
    expect((await page.request.post(`/api/jobs/${id}/parts`, { data: part })).status()).toBe(201);
  return id;
}

test('the estimator e-mails a quote; the customer opens the link, accepts, is declined a card, pays the deposit with the test card; the shop sees deposit paid and a receipt goes out', async ({
  page,
  browser,
}) => {
  await signIn(page, 'estimator');
  const stamp = Date.now();
  const email = `ruth.${stamp}@example.com`;
  const jobName = `Calloway bookcase ${stamp}`;
  const jobId = await jobForNewCustomer(page, jobName, email);
  await saveDraftPlan(page, jobName, 'Plan A');

  // The estimator builds the quote from the plan with the defaults and sends it.
  await page.goto(`/jobs/${jobId}/quotes`);
  await page.getByRole('button', { name: 'Build a quote' }).click();
  await expect(page.getByRole('heading', { level: 2, name: /^Q-\d{4} rev A/ })).toBeVisible();
  const revisionId = page.url().split('/').pop()!;
  const usd = (minor: number) => new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(minor / 100);
  const total = usd((await (await page.request.get(`/api/quotes/${revisionId}`)).json()).totals.totalMinor);
  page.once('dialog', (d) => {
    expect(d.message()).toContain(`to Ruth Calloway <${email}>`);
    void d.accept();
  });
  await page.getByRole('button', { name: 'Send to Ruth Calloway' }).click();
  await expect(page.getByRole('heading', { level: 2, name: /rev A/ })).toContainText('Sent');
  await expect(page.getByTestId('quote-history')).toContainText(/valid until \d{4}-\d{2}-\d{2}/);

  // The mail as the customer gets it: the PDF attached and one link to their page.
  const mail = await mailFor(email, /your quote Q-\d{4} rev A/);
  expect(mail.subject).toBe(`Larkspur Cabinet Works: your quote ${mail.subject.match(/Q-\d{4} rev A/)![0]} for ${jobName}`);
  expect(mail.attachments.map((a) => a.contentType)).toEqual(['application/pdf']);
  const link = /https?:\/\/\S+\/q\/[A-Za-z0-9_-]{43}/.exec(mail.text ?? '')?.[0];
  expect(link, mail.text ?? '').toBeTruthy();
  expect(mail.html).toContain(`href="${link}"`);
  expect(mail.html).not.toMatch(/<img|<script|url\(/i);

  // A fresh browser, signed out, on a phone: the customer's page.
  const customer = await browser.newContext({ viewport: { width: 390, height: 844 }, hasTouch: true, isMobile: true });
  const phone = await customer.newPage();
  await phone.goto(link!);
  await expect(phone.getByRole('heading', { level: 1 })).toHaveText(/^Quote Q-\d{4} rev A$/);
  await expect(phone.getByTestId('quote-total')).toHaveText(total);
  await expect(phone.locator('body')).not.toContainText(/Margin|Labour hours|Cost/);
  expect(await pageOverflow(phone), 'sideways scroll at 390').toBeNull();
  await shot(phone, 'quote-deposit-01-customer-390');
  for (const width of [1440, 820] as const) {
    await phone.setViewportSize({ width, height: 900 });
    expect(await pageOverflow(phone), `sideways scroll at ${width}`).toBeNull();
    await shot(phone, `quote-deposit-01-customer-${width}`);
  }
  await phone.setViewportSize({ width: 390, height: 844 });

  await phone.getByLabel('Your full name').fill('Ruth Calloway');
  await phone.getByRole('button', { name: 'Accept the quote' }).click();
  await expect(phone.getByRole('region', { name: 'Your answer' }).getByRole('alert')).toHaveText('Tick the box to agree to the terms.');
  await phone.getByRole('checkbox', { name: /agree to Larkspur Cabinet Works’s terms/ }).check();
  await phone.getByRole('button', { name: 'Accept the quote' }).click();
  await expect(phone.getByTestId('quote-state')).toContainText('Accepted by Ruth Calloway');
  await shot(phone, 'quote-deposit-02-accepted-390');
  await expect.poll(async () => (await page.request.get(`/api/jobs/${jobId}`).then((r) => r.json())).status).toBe('accepted');
  await mailFor(email, /you accepted quote/);

  // The test checkout: the declined card leaves the quote accepted and unpaid.
  const deposit = (await phone.getByTestId('quote-deposit').textContent()) ?? '';
  await phone.getByRole('button', { name: `Pay the deposit (${deposit})` }).click();
  await expect(phone.getByTestId('checkout-amount')).toHaveText(deposit);
  await phone.getByLabel('Card number').fill('4000 0000 0000 0002');
  await phone.getByRole('button', { name: `Pay ${deposit}` }).click();
  await expect(phone.getByRole('alert')).toContainText('Your card was declined.');
  await shot(phone, 'quote-deposit-03-declined-390');
  expect((await page.request.get(`/api/jobs/${jobId}`).then((r) => r.json())).status).toBe('accepted');

  await phone.getByLabel('Card number').fill('4242 4242 4242 4242');
  await phone.getByRole('button', { name: `Pay ${deposit}` }).click();
  await expect(phone.getByTestId('quote-state')).toContainText(`Deposit received`);
  await expect(phone.getByTestId('quote-state')).toContainText(deposit);
  await shot(phone, 'quote-deposit-04-paid-390');
  await customer.close();

  // The shop's side: the job is deposit paid, the quote says who accepted and when it was paid; a receipt went out.
  const receipt = await mailFor(email, /deposit received/);
  expect(receipt.text).toContain(`We received your deposit of ${deposit}`);
  await page.goto('/jobs');
  await expect(page.getByRole('row').filter({ hasText: jobName }).getByText('Deposit paid', { exact: true })).toBeVisible();
  await page.goto(`/jobs/${jobId}/quotes/${revisionId}`);
  await expect(page.getByRole('heading', { level: 2, name: /rev A/ })).toContainText('Accepted · deposit paid');
  await expect(page.getByTestId('quote-history')).toContainText('Accepted online by Ruth Calloway');
  await expect(page.getByTestId('quote-history')).toContainText(`Deposit of ${deposit} paid on`);
  for (const width of WIDTHS) {
    await page.setViewportSize({ width, height: 900 });
    expect(await pageOverflow(page), `sideways scroll at ${width}`).toBeNull();
    await shot(page, `quote-deposit-05-shop-${width}`);
  }
});

test('a customer declines with a reason; the job shows declined and the link cannot be paid', async ({ page, browser }) => {
  await signIn(page, 'estimator');
  const stamp = Date.now();
  const email = `ruth.decline.${stamp}@example.com`;
  const jobName = `Calloway window seat ${stamp}`;
  const jobId = await jobForNewCustomer(page, jobName, email);
  const quote = await (await page.request.post(`/api/jobs/${jobId}/quotes`, { data: { planId: null } })).json();
  await page.request.patch(`/api/quotes/${quote.id}`, {
    data: {
      lines: [
        { id: 'o-1', kind: 'other', description: 'Window seat, built in', quantity: 1, unit: 'each', unitCostMinor: 64000, taxable: true, note: '' },
      ],
    },
  });
  expect((await page.request.post(`/api/quotes/${quote.id}/send`)).status()).toBe(200);
  const link = /https?:\/\/\S+\/q\/[A-Za-z0-9_-]{43}/.exec((await mailFor(email, /your quote/)).text ?? '')![0];

  const customer = await browser.newContext({ viewport: { width: 820, height: 1000 } });
  const tablet = await customer.newPage();
  await tablet.goto(link);
  await tablet.getByText('Decline the quote').first().click();
  await tablet.getByLabel(/Why, if you would like to say/).fill('We are moving house next spring.');
  await tablet.getByRole('button', { name: 'Decline the quote' }).click();
  await expect(tablet.getByTestId('quote-state')).toContainText('Declined');
  await expect(tablet.getByRole('button', { name: /Pay the deposit/ })).toHaveCount(0);
  await shot(tablet, 'quote-deposit-06-declined-820');
  await customer.close();

  expect((await page.request.get(`/api/jobs/${jobId}`).then((r) => r.json())).status).toBe('declined');
  await page.goto(`/jobs/${jobId}/quotes/${quote.id}`);
  await expect(page.getByTestId('quote-history')).toContainText('“We are moving house next spring.”');
});

import { shot, signIn } from './support/session';
import { expect, test } from './support/test';
import { mailFor } from './support/mail';

test('the owner invites a new cutter; the link in the e-mail lets them choose a password, sign in, and see the shop floor', async ({
  page,
  browser,
}) => {
  await page.setViewportSize({ width: 1440, height: 900 });
  await signIn(page, 'owner');
  await page.goto('/team');
  const email = `juno.${Date.now()}@larkspur.example`;
  const form = page.getByRole('form', { name: 'Add a person' });
  await form.getByLabel('Name').fill('Juno Ashby');
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Role').selectOption('cutter');
  await form.getByRole('button', { name: 'Send invite' }).click();
  await expect(form.getByRole('status')).toHaveText(`Invited Juno Ashby: the e-mail is on its way to ${email}.`);
  const row = page.getByRole('row').filter({ hasText: email });
  await expect(row.getByText('Invited', { exact: true })).toBeVisible();
  await expect(row.getByRole('button', { name: 'Resend the invite to Juno Ashby' })).toBeVisible();
  await shot(page, 'invite-team-1440');

  // The mail as the recipient gets it: both parts, one link, nothing loaded from anywhere.
  const mail = await mailFor(email);
  expect(mail.subject).toBe('Maren Okafor invited you to Larkspur Cabinet Works on Kerfwise');
  expect(mail.from).toMatch(/no-reply@/);
  expect(mail.messageId).toMatch(/^<.+@.+>$/);
  expect(mail.text).toContain('Hello Juno Ashby,');
  expect(mail.text).toContain('as a cutter');
  const link = /https?:\/\/\S+\/welcome\/[A-Za-z0-9_-]{43}/.exec(mail.text ?? '')?.[0];
  expect(link, mail.text ?? '').toBeTruthy();
  expect(mail.html).toContain(`href="${link}"`);
  expect(mail.html).not.toMatch(/<img|<script|url\(/i);

  // The owner reads it on the demo's Sent mail page.
  await page.goto('/sent-mail');
  await expect(page.getByRole('heading', { name: 'Sent mail' })).toBeVisible();
  const article = page.getByRole('article', { name: `Mail: ${mail.subject}` });
  await expect(article.getByRole('region', { name: 'Plain-text part' })).toContainText('Hello Juno Ashby,');
  await expect(article.frameLocator('iframe').getByRole('link', { name: 'Choose your password' })).toHaveAttribute('href', link!);
  await shot(page, 'sent-mail-1440');
  await page.setViewportSize({ width: 390, height: 844 });
  await expect(article.frameLocator('iframe').getByText('Hello Juno Ashby,')).toBeVisible();
  await shot(page, 'sent-mail-390');
  // A full-page capture leaves a frame blank in headless Chromium; the mail's HTML as a phone shows it:
  await article.locator('iframe').scrollIntoViewIfNeeded();
  await article
    .locator('iframe')
    .screenshot({ path: `test-results/screens${process.env.E2E_PORT ? '-' + process.env.E2E_PORT : ''}/sent-mail-html-390.png` });
  await page.goto('/outbox');
  await expect(page.getByRole('listitem').filter({ hasText: email }).getByText('Sent', { exact: true })).toBeVisible();
  await shot(page, 'outbox-390');

  // A fresh browser, as the new cutter's phone would be.
  const ctx = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const phone = await ctx.newPage();
  await phone.goto(link!);
  await expect(phone.getByRole('heading', { name: 'Welcome to Larkspur Cabinet Works' })).toBeVisible();
  await expect(phone.getByText(email)).toBeVisible();
  await shot(phone, 'welcome-390');
  await phone.getByLabel('New password').fill('offcut-rack-morning');
  await phone.getByLabel('The same again').fill('offcut-rack-mornings');
  await phone.getByRole('button', { name: 'Set password and sign in' }).click();
  await expect(phone.getByRole('alert').filter({ hasText: 'The two passwords are not the same.' })).toBeVisible();
  await phone.getByLabel('The same again').fill('offcut-rack-morning');
  await phone.getByRole('button', { name: 'Set password and sign in' }).click();
  await expect(phone).toHaveURL(/\/shop-floor$/);
  await expect(phone.getByRole('heading', { name: 'Shop floor', level: 1 })).toBeVisible();
  await expect(phone.getByTestId('signed-in-as')).toHaveText('Juno Ashby');
  await shot(phone, 'welcome-shop-floor-390');

  await ctx.close();

  // In another browser the new password signs in; the link is spent.
  const again = await browser.newContext({ viewport: { width: 390, height: 844 } });
  const phone2 = await again.newPage();
  await phone2.goto('/sign-in');
  await phone2.getByLabel('E-mail').fill(email);
  await phone2.getByLabel('Password').fill('offcut-rack-morning');
  await phone2.getByRole('button', { name: 'Sign in' }).click();
  await expect(phone2).toHaveURL(/\/shop-floor$/);
  await expect(phone2.getByTestId('signed-in-as')).toHaveText('Juno Ashby');
  await phone2.goto(link!);
  await expect(
    phone2.getByRole('alert').filter({ hasText: 'This link has already been used. Sign in with your password, or ask for a new link.' }),
  ).toBeVisible();
  await again.close();

  await page.setViewportSize({ width: 1440, height: 900 });
  await page.goto('/team');
  await expect(page.getByRole('row').filter({ hasText: email }).getByText('Active', { exact: true })).toBeVisible();
});

test('a forgotten password: the reset mail’s link sets a new one', async ({ browser }) => {
  const ctx = await browser.newContext({ viewport: { width: 1440, height: 900 } });
  const page = await ctx.newPage();
  // Someone new, so the demo people's passwords stay as the other specs expect.
  const owner = await ctx.newPage();
  await signIn(owner, 'owner');
  const email = `pia.${Date.now()}@larkspur.example`;
  const added = await owner.request.post('/api/team', { data: { name: 'Pia Lindqvist', email, role: 'estimator', password: 'first-one-by-hand' } });
  expect(added.status()).toBe(201);
  await owner.close();

  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  await expect(page.getByRole('heading', { name: 'Forgot your password?' })).toBeVisible();
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('button', { name: 'Mail me a link' }).click();
  await expect(page.getByRole('status')).toContainText('If that address belongs to an active account');
  await shot(page, 'forgot-password-1440');

  const mail = await mailFor(email);
  expect(mail.subject).toBe('Reset your Kerfwise password for Larkspur Cabinet Works');
  const link = /https?:\/\/\S+\/reset-password\/[A-Za-z0-9_-]{43}/.exec(mail.text ?? '')?.[0];
  expect(link, mail.text ?? '').toBeTruthy();
  expect(mail.html).toContain(`href="${link}"`);
  await page.goto(link!);
  await expect(page.getByRole('heading', { name: 'Choose a new password' })).toBeVisible();
  await shot(page, 'reset-password-1440');
  await page.getByLabel('New password').fill('second-one-by-link');
  await page.getByLabel('The same again').fill('second-one-by-link');
  await page.getByRole('button', { name: 'Save and sign in' }).click();
  await expect(page.getByTestId('signed-in-as')).toHaveText('Pia Lindqvist');
  await ctx.close();
});

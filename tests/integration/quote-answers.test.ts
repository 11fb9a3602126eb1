/**
 * The customer's side of a quote, through the route handlers: the quote e-mailed with its PDF and link, the page
 * the link opens, accept / decline, expiry, and the deposit paid through the payments SDK against the local fake,
 * whose signed webhooks reach the webhook route through a small HTTP bridge (the signature is checked on the bytes).
 */
import { createHash } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { and, eq } from 'drizzle-orm';
import { NextRequest } from 'next/server';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { jobs, mailOutbox, paymentEvents, quotePayments, quoteRevisions, shops } from '@/db/schema';
import * as answerRoute from '@/app/api/q/[token]/answer/route';
import * as checkoutRoute from '@/app/api/q/[token]/checkout/route';
import * as webhookRoute from '@/app/api/payments/webhook/route';
import * as sendRoute from '@/app/api/quotes/[id]/send/route';
import * as revisionsRoute from '@/app/api/quotes/[id]/revisions/route';
import { customerQuote, expireQuotes } from '@/db/queries/quote-answers';
import { sendRevision } from '@/db/queries/quotes';
import { fakeClient } from '@/server/payments/client';
import { FAKE_SECRET_KEY, newWebhookSecret } from '@/lib/payments/config';
import { startPaymentsFake, TEST_CARD_DECLINED, TEST_CARD_PAYS, type PaymentsFake } from '@/server/payments/fake';
import { BROWSER_HEADERS } from '../support/fixtures';
import { call } from '../support/shop-day';
import { jobWithDraftQuote } from '../support/quote-fixture';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';

let handle: DbHandle;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ handle, fx } = app));

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
const webhookSecret = newWebhookSecret();
let fake: PaymentsFake;
let bridge: http.Server;
let stripe: Stripe;

beforeAll(async () => {
  // The webhook route reaches the fake through the SDK; the fake posts its events to the bridge, which hands the
  // request to the route handler as Next.js would.
  bridge = http.createServer(async (req, res) => {
    let body = '';
    for await (const chunk of req) body += chunk;
    const headers = new Headers();
    for (const [k, v] of Object.entries(req.headers)) if (typeof v === 'string') headers.set(k, v);
    const answer = await (webhookRoute.POST as Handler)(new NextRequest('http://localhost/api/payments/webhook', { method: 'POST', headers, body }), {
      params: Promise.resolve({}),
    });
    res.writeHead(answer.status, { 'content-type': 'application/json' });
    res.end(await answer.text());
  });
  await new Promise<void>((r) => bridge.listen(0, '127.0.0.1', r));
  fake = await startPaymentsFake({ webhookUrl: `http://127.0.0.1:${(bridge.address() as AddressInfo).port}/`, webhookSecret });
  Object.assign(process.env, {
    KERFWISE_PAYMENTS_URL: fake.url,
    KERFWISE_PAYMENTS_WEBHOOK_SECRET: webhookSecret,
    STRIPE_SECRET_KEY: '',
    NEXTAUTH_URL: 'http://localhost',
  });
  (globalThis as { __kerfwisePayments?: unknown }).__kerfwisePayments = undefined;
  stripe = fakeClient(fake.url);
});
afterAll(async () => {
  await fake?.close();
  await new Promise((r) => bridge?.close(r));
});

/** A request from the customer's browser on their quote page (signed out), from a given address. */
async function asCustomer(handler: unknown, token: string, path: string, body: unknown, address = '198.51.100.7') {
  const req = new NextRequest(new URL(`/api/q/${token}/${path}`, 'http://localhost'), {
    method: 'POST',
    headers: { ...BROWSER_HEADERS, 'content-type': 'application/json', 'x-forwarded-for': address },
    body: JSON.stringify(body),
  });
  const res = await (handler as Handler)(req, { params: Promise.resolve({ token }) });
  return { status: res.status, body: await res.json() };
}

const mailsTo = (to: string) => handle.db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, to));
const tokenIn = (text: string) => /\/q\/([A-Za-z0-9_-]{43})/.exec(text)?.[1] ?? null;

/** A draft quote for a customer with an e-mail, sent through the route: the revision, its customer and the link's token. */
async function sentQuote(lines?: Parameters<typeof jobWithDraftQuote>[2]) {
  const made = await jobWithDraftQuote(handle.db, fx.mine.id, lines);
  const sent = await call(sendRoute.POST, `/api/quotes/${made.revision.id}/send`, made.revision.id, fx.estimator, { method: 'POST' });
  expect(sent.status).toBe(200);
  const [mail] = await mailsTo(made.customer.email);
  const token = tokenIn(mail.textBody)!;
  return { ...made, token, mail };
}

const jobStatus = async (jobId: string) => (await handle.db.select({ status: jobs.status }).from(jobs).where(eq(jobs.id, jobId)))[0].status;

describe('sending a quote', () => {
  test('e-mails the customer the PDF and a link to their page; the token is kept only as its SHA-256', async () => {
    const { revision, customer, token, mail } = await sentQuote();
    expect(mail).toMatchObject({
      kind: 'quote',
      status: 'pending',
      subject: expect.stringMatching(/^.+: your quote Q-\d{4,} rev A for Quoted job \d+$/),
    });
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    // 75.00 of delivery, no markup on an "other" line, no tax (the fixture's line): $75.00 in all, deposit 50 % = $37.50 (by hand).
    expect(mail.textBody).toContain('$75.00 in all');
    expect(mail.textBody).toContain('A deposit of $37.50 is paid online once you accept.');
    expect(mail.htmlBody).toContain(`/q/${token}`);
    expect(mail.attachments).toHaveLength(1);
    expect(mail.attachments[0]).toMatchObject({ contentType: 'application/pdf', filename: expect.stringMatching(/\.pdf$/) });
    expect(Buffer.from(mail.attachments[0].content, 'base64').subarray(0, 5).toString()).toBe('%PDF-');
    const [row] = await handle.db.select().from(quoteRevisions).where(eq(quoteRevisions.id, revision.id));
    expect(row.linkTokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(row)).not.toContain(token);
    expect(customer.email).toBe(mail.toAddress);
  });

  test('the last valid day counts from the sending day on the shop’s clock (21:30 in Chicago is still the 3rd)', async () => {
    await handle.db.update(shops).set({ timeZone: 'America/Chicago' }).where(eq(shops.id, fx.mine.id));
    try {
      const { revision } = await jobWithDraftQuote(handle.db, fx.mine.id);
      // 2026-12-04 03:30 UTC is 2026-12-03 21:30 CST (UTC−6); 30 days after Dec 3 is Jan 2 (Dec has 31 days: by hand).
      const sent = await sendRevision({ db: handle.db, shopId: fx.mine.id, userId: fx.estimator.id }, revision.id, new Date('2026-12-04T03:30:00Z'));
      expect(sent.validUntil).toBe('2027-01-02');
    } finally {
      await handle.db.update(shops).set({ timeZone: 'UTC' }).where(eq(shops.id, fx.mine.id));
    }
  });

  test('a customer without an e-mail address cannot be sent a quote (422, nothing queued)', async () => {
    const { revision, customer } = await jobWithDraftQuote(handle.db, fx.mine.id);
    const { customers } = await import('@/db/schema');
    await handle.db.update(customers).set({ email: '' }).where(eq(customers.id, customer.id));
    const res = await call(sendRoute.POST, `/api/quotes/${revision.id}/send`, revision.id, fx.estimator, { method: 'POST' });
    expect(res.status).toBe(422);
    expect(res.body.error).toBe(`${customer.name} has no e-mail address: add it on their customer page, then send.`);
    expect((await handle.db.select().from(quoteRevisions).where(eq(quoteRevisions.id, revision.id)))[0].status).toBe('draft');
  });

  test('rev B sent replaces rev A: A’s link says so and cannot be answered; B’s mail says what it replaces', async () => {
    const first = await sentQuote();
    const revB = await call(revisionsRoute.POST, `/api/quotes/${first.revision.id}/revisions`, first.revision.id, fx.estimator, { method: 'POST' });
    await call(sendRoute.POST, `/api/quotes/${revB.body.id}/send`, revB.body.id, fx.estimator, { method: 'POST' });
    const mails = await mailsTo(first.customer.email);
    const second = mails.find((m) => m.subject.includes('rev B'))!;
    expect(second.textBody).toContain('This quote replaces rev A; its link no longer works.');
    expect((await customerQuote(handle.db, first.token)).state).toBe('replaced');
    const refused = await asCustomer(answerRoute.POST, first.token, 'answer', { answer: 'accept', fullName: 'Dana Whitfield', agree: true });
    expect(refused).toMatchObject({
      status: 409,
      body: { error: 'This quote was replaced by a newer one: use the link in the shop’s latest e-mail.' },
    });
    expect((await customerQuote(handle.db, tokenIn(second.textBody)!)).state).toBe('open');
  });
});

describe('the customer’s page', () => {
  test('shows prices only: no cost, markup, margin or hours anywhere in what it is given', async () => {
    const { token } = await sentQuote([
      {
        id: 'm-1',
        kind: 'material',
        description: 'Baltic birch 18 mm',
        quantity: 2,
        unit: 'sheet',
        unitCostMinor: 8800,
        taxable: true,
        note: 'supplier price',
      },
      { id: 'l-1', kind: 'labour', description: 'Saw time', quantity: 1.5, unit: 'h', unitCostMinor: 6500, taxable: false, note: '' },
    ]);
    const page = await customerQuote(handle.db, token);
    const json = JSON.stringify(page);
    for (const word of ['costMinor', 'unitCostMinor', 'markup', 'margin', 'supplier price']) expect(json).not.toContain(word);
    // Material: 2 × 88.00 = 176.00, +30 % = 52.80 → 228.80; labour 1.5 h × 65.00 = 97.50 as a sum (by hand).
    expect(page.lines).toEqual([
      { id: 'm-1', description: 'Baltic birch 18 mm', quantity: 2, unit: 'sheet', unitPriceMinor: 11440, priceMinor: 22880 },
      { id: 'l-1', description: 'Saw time', quantity: null, unit: '', unitPriceMinor: null, priceMinor: 9750 },
    ]);
    expect(page.totals).toEqual({ subtotalMinor: 32630, discountMinor: 0, taxMinor: 0, totalMinor: 32630, depositMinor: 16315, balanceMinor: 16315 });
  });

  test('a link that does not exist is a 404; an address that keeps trying bad links is stopped (429)', async () => {
    const bad = 'A'.repeat(43);
    const address = '203.0.113.77';
    const statuses: number[] = [];
    for (let i = 0; i < 12; i++)
      statuses.push((await asCustomer(answerRoute.POST, bad, 'answer', { answer: 'decline', reason: '' }, address)).status);
    // Ten failed tries in 15 minutes are allowed (server/api/limit.ts), the rest refused.
    expect(statuses.slice(0, 10)).toEqual(Array(10).fill(404));
    expect(statuses.slice(10)).toEqual([429, 429]);
  });
});

describe('the customer’s answer', () => {
  test('accepting records the typed name, time and address; the job is accepted; a confirmation is mailed; a second answer is refused', async () => {
    const { job, customer, token } = await sentQuote();
    const noName = await asCustomer(answerRoute.POST, token, 'answer', { answer: 'accept', fullName: ' ', agree: true });
    expect(noName).toMatchObject({ status: 422, body: { fields: { fullName: ['Type your full name to accept.'] } } });
    const unagreed = await asCustomer(answerRoute.POST, token, 'answer', { answer: 'accept', fullName: 'Dana Whitfield', agree: false });
    expect(unagreed).toMatchObject({ status: 422, body: { fields: { agree: ['Tick the box to agree to the terms.'] } } });

    const accepted = await asCustomer(
      answerRoute.POST,
      token,
      'answer',
      { answer: 'accept', fullName: '  Dana Whitfield ', agree: true },
      '192.0.2.44',
    );
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({
      state: 'accepted',
      paymentClosed: null,
      acceptedName: 'Dana Whitfield',
      declineReason: null,
      answeredAt: expect.any(String),
    });
    const [row] = await handle.db
      .select()
      .from(quoteRevisions)
      .where(eq(quoteRevisions.linkTokenHash, createHash('sha256').update(token).digest('hex')));
    expect(row).toMatchObject({ status: 'accepted', acceptedName: 'Dana Whitfield', answeredFrom: '192.0.2.44', answeredAt: expect.any(Date) });
    expect(await jobStatus(job.id)).toBe('accepted');
    const confirmation = (await mailsTo(customer.email)).find((m) => m.kind === 'quote-accepted')!;
    expect(confirmation.textBody).toContain('was accepted by Dana Whitfield on');
    expect(confirmation.textBody).toContain('The next step is the deposit of $37.50');

    expect(await asCustomer(answerRoute.POST, token, 'answer', { answer: 'decline', reason: 'changed my mind' })).toMatchObject({
      status: 409,
      body: { error: 'You have already accepted this quote.' },
    });
    // What they agreed to stays as it was: no new revision of an accepted quote.
    expect((await call(revisionsRoute.POST, `/api/quotes/${row.id}/revisions`, row.id, fx.estimator, { method: 'POST' })).status).toBe(409);
  });

  test('declining with a reason makes the job declined and closes payment; a new revision sent brings it back to quoted', async () => {
    const { job, revision, token } = await sentQuote();
    const declined = await asCustomer(answerRoute.POST, token, 'answer', { answer: 'decline', reason: 'Went with a simpler design.' });
    expect(declined.body).toMatchObject({ state: 'declined', declineReason: 'Went with a simpler design.' });
    expect(await jobStatus(job.id)).toBe('declined');
    expect(await asCustomer(checkoutRoute.POST, token, 'checkout', {})).toMatchObject({
      status: 409,
      body: { error: 'You declined this quote. Ask the shop if you would like a new one.' },
    });
    const revB = await call(revisionsRoute.POST, `/api/quotes/${revision.id}/revisions`, revision.id, fx.estimator, { method: 'POST' });
    await call(sendRoute.POST, `/api/quotes/${revB.body.id}/send`, revB.body.id, fx.estimator, { method: 'POST' });
    expect(await jobStatus(job.id)).toBe('quoted');
  });

  test('past its last valid day a quote cannot be answered (410); the expiry round marks it and its job, once', async () => {
    const { job, revision, token } = await sentQuote();
    const [row] = await handle.db.select().from(quoteRevisions).where(eq(quoteRevisions.id, revision.id));
    const dayAfter = new Date(`${row.validUntil}T12:00:00Z`);
    dayAfter.setUTCDate(dayAfter.getUTCDate() + 1);
    expect((await customerQuote(handle.db, token, dayAfter)).state).toBe('expired');
    expect((await customerQuote(handle.db, token, new Date(`${row.validUntil}T23:59:00Z`))).state).toBe('open');
    const expired = await expireQuotes(handle.db, dayAfter);
    expect(expired).toBeGreaterThanOrEqual(1);
    expect((await handle.db.select().from(quoteRevisions).where(eq(quoteRevisions.id, revision.id)))[0].status).toBe('expired');
    expect(await jobStatus(job.id)).toBe('expired');
    expect(await expireQuotes(handle.db, dayAfter)).toBe(0);
    expect(await asCustomer(answerRoute.POST, token, 'answer', { answer: 'accept', fullName: 'Dana Whitfield', agree: true })).toMatchObject({
      status: 410,
      body: { error: 'This quote has expired. Ask the shop for a new one.' },
    });
  });
});

describe('the deposit, through the payments SDK and the local fake', () => {
  async function acceptedQuote() {
    const q = await sentQuote();
    expect((await asCustomer(answerRoute.POST, q.token, 'answer', { answer: 'accept', fullName: 'Dana Whitfield', agree: true })).status).toBe(200);
    return q;
  }
  const cardOn = (url: string, card: string) =>
    fetch(url, {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ card }),
      redirect: 'manual',
    });
  const paymentsOf = (revisionId: string) => handle.db.select().from(quotePayments).where(eq(quotePayments.revisionId, revisionId));

  test('cannot be paid before the quote is accepted', async () => {
    const { token } = await sentQuote();
    expect(await asCustomer(checkoutRoute.POST, token, 'checkout', {})).toMatchObject({
      status: 409,
      body: { error: 'Accept the quote first; then you can pay the deposit.' },
    });
  });

  test('the test card pays the server’s deposit: a signed webhook marks it paid, the job deposit paid, and a receipt is mailed once', async () => {
    const { job, revision, customer, token } = await acceptedQuote();
    const checkout = await asCustomer(checkoutRoute.POST, token, 'checkout', {});
    expect(checkout.status).toBe(200);
    const session = await stripe.checkout.sessions.retrieve(checkout.body.url.split('/').pop());
    // The fixture's $75.00 quote at 50 %: $37.50 (by hand), computed on the server.
    expect(session).toMatchObject({ amount_total: 3750, currency: 'usd', payment_status: 'unpaid', client_reference_id: revision.id });

    const declined = await cardOn(checkout.body.url, TEST_CARD_DECLINED);
    expect(declined.status).toBe(200);
    expect(await declined.text()).toContain('Your card was declined.');
    expect(await jobStatus(job.id)).toBe('accepted');

    const paid = await cardOn(checkout.body.url, TEST_CARD_PAYS);
    expect(paid.status).toBe(303);
    expect(paid.headers.get('location')).toBe(`http://localhost/q/${token}?checkout=${session.id}`);
    const delivered = fake.deliveries.filter((d) => d.type === 'checkout.session.completed').at(-1)!;
    expect(delivered.status).toBe(200);
    const [payment] = await paymentsOf(revision.id);
    expect(payment).toMatchObject({ status: 'paid', amountMinor: 3750, currency: 'USD', paymentIntentId: expect.stringMatching(/^pi_test_/) });
    expect(await jobStatus(job.id)).toBe('deposit-paid');
    expect((await customerQuote(handle.db, token)).state).toBe('paid');
    const receipts = (await mailsTo(customer.email)).filter((m) => m.kind === 'deposit-receipt');
    expect(receipts).toHaveLength(1);
    expect(receipts[0].textBody).toContain('We received your deposit of $37.50');
    expect(receipts[0].textBody).toContain('balance still to pay $37.50');
    expect(await asCustomer(checkoutRoute.POST, token, 'checkout', {})).toMatchObject({
      status: 409,
      body: { error: 'The deposit is already paid. Thank you.' },
    });

    // A refund from the payments service puts the job back to accepted (the deposit is no longer held).
    await stripe.refunds.create({ payment_intent: payment.paymentIntentId! });
    expect((await paymentsOf(revision.id))[0]).toMatchObject({ status: 'refunded', refundedAt: expect.any(Date) });
    expect(await jobStatus(job.id)).toBe('accepted');
  });

  test('the webhook refuses a missing, wrong or stale signature (400) and applies a replayed event once', async () => {
    const { revision, customer, token } = await acceptedQuote();
    const checkout = await asCustomer(checkoutRoute.POST, token, 'checkout', {});
    const sessionId: string = checkout.body.url.split('/').pop();
    const event = {
      id: `evt_test_replay_${revision.id}`,
      object: 'event',
      type: 'checkout.session.completed',
      data: {
        object: {
          id: sessionId,
          object: 'checkout.session',
          payment_status: 'paid',
          amount_total: 3750,
          currency: 'usd',
          payment_intent: 'pi_test_replayed',
        },
      },
    };
    const payload = JSON.stringify(event);
    const signer = new Stripe(FAKE_SECRET_KEY);
    const post = async (signature: string | null, body = payload) => {
      const headers: Record<string, string> = { 'content-type': 'application/json' };
      if (signature) headers['stripe-signature'] = signature;
      const res = await (webhookRoute.POST as Handler)(new NextRequest('http://localhost/api/payments/webhook', { method: 'POST', headers, body }), {
        params: Promise.resolve({}),
      });
      return { status: res.status, body: await res.json() };
    };
    expect((await post(null)).status).toBe(400);
    expect((await post(signer.webhooks.generateTestHeaderString({ payload, secret: newWebhookSecret() }))).status).toBe(400);
    // Ten minutes old: outside the SDK's five-minute tolerance.
    const stale = signer.webhooks.generateTestHeaderString({ payload, secret: webhookSecret, timestamp: Math.floor(Date.now() / 1000) - 600 });
    expect((await post(stale)).body.error).toMatch(/^The event's signature does not check out: Timestamp outside the tolerance zone/);
    // The right secret over other bytes (the amount changed after signing) fails too.
    const signed = signer.webhooks.generateTestHeaderString({ payload, secret: webhookSecret });
    expect((await post(signed, payload.replace('3750', '1'))).status).toBe(400);
    expect((await paymentsOf(revision.id))[0].status).toBe('open');

    expect((await post(signed)).body).toMatchObject({ received: true, outcome: 'paid', replay: false });
    expect((await post(signer.webhooks.generateTestHeaderString({ payload, secret: webhookSecret }))).body).toMatchObject({
      outcome: 'paid',
      replay: true,
    });
    expect((await mailsTo(customer.email)).filter((m) => m.kind === 'deposit-receipt')).toHaveLength(1);
    expect(await handle.db.select().from(paymentEvents).where(eq(paymentEvents.id, event.id))).toHaveLength(1);
  });

  test('a signed event whose amount is not the quote’s deposit is refused (422) and changes nothing', async () => {
    const { job, revision, token } = await acceptedQuote();
    const checkout = await asCustomer(checkoutRoute.POST, token, 'checkout', {});
    const sessionId: string = checkout.body.url.split('/').pop();
    const signer = new Stripe(FAKE_SECRET_KEY);
    for (const [amount, currency] of [
      [100, 'usd'],
      [3750, 'eur'],
    ] as const) {
      const payload = JSON.stringify({
        id: `evt_test_amount_${amount}_${currency}_${revision.id}`,
        object: 'event',
        type: 'checkout.session.completed',
        data: {
          object: {
            id: sessionId,
            object: 'checkout.session',
            payment_status: 'paid',
            amount_total: amount,
            currency,
            payment_intent: 'pi_test_short',
          },
        },
      });
      const res = await (webhookRoute.POST as Handler)(
        new NextRequest('http://localhost/api/payments/webhook', {
          method: 'POST',
          headers: {
            'content-type': 'application/json',
            'stripe-signature': signer.webhooks.generateTestHeaderString({ payload, secret: webhookSecret }),
          },
          body: payload,
        }),
        { params: Promise.resolve({}) },
      );
      expect(res.status).toBe(422);
      expect((await res.json()).error).toBe(
        `The payment (${amount} ${currency}) does not match the quote's deposit (3750 usd), so it was not recorded.`,
      );
    }
    expect((await paymentsOf(revision.id))[0].status).toBe('open');
    expect(await jobStatus(job.id)).toBe('accepted');
    expect(
      await handle.db
        .select()
        .from(paymentEvents)
        .where(and(eq(paymentEvents.type, 'checkout.session.completed'), eq(paymentEvents.paymentId, (await paymentsOf(revision.id))[0].id))),
    ).toEqual([]);
  });
});

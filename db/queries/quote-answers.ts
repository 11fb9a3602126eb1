/**
 * The customer's side of a quote: the link sent with it, the page it opens (/q/<token>), the answer given there,
 * the deposit paid through the payments service, and quotes that run past their validity unanswered.
 *
 * The link's token is 32 random bytes (base64url) and exists only in the mail; the database keeps its SHA-256.
 * Every change here is one transaction that also moves the job's status (db/queries/job-status.ts) and queues the
 * mail it causes (server/mail/outbox.ts); the caller wakes the mail sender after it returns.
 */
import { createHash, randomBytes } from 'node:crypto';
import { and, eq, inArray, lt, sql } from 'drizzle-orm';
import type Stripe from 'stripe';
import type { Db } from '../open';
import { customers, jobs, paymentEvents, quotePayments, quoteRevisions, quotes, shops } from '../schema';
import { formatMoney } from '@/lib/costing/money';
import { formatShopDateTime, shopDay } from '@/lib/dates/shop-time';
import { appBaseUrl } from '@/lib/mail/config';
import { enqueueMail } from '@/server/mail/outbox';
import { depositReceiptMail, quoteAcceptedMail, type QuoteMailFacts } from '@/lib/mail/templates';
import { customerQuoteState, refuseAnswer, refusePayment, type CustomerQuoteState } from '@/lib/quotes/answer';
import { customerCopy, type CustomerLine, type CustomerTotals } from '@/lib/quotes/customer-copy';
import type { QuoteAnswer } from '@/shared/schemas/quote-answer';
import { quoteNumberText, revisionLetter } from '@/shared/schemas/quote';
import { recordAudit } from './audit';
import { syncJobStatus } from './job-status';
import { revisionTotals } from './quotes';
import { invalid, notFoundBecause, conflict, gone, unavailable } from '@/lib/errors';

export const QUOTE_TOKEN = /^[A-Za-z0-9_-]{43}$/;
export const hashQuoteToken = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');
export const quoteLinkPath = (token: string) => `/q/${token}`;

/** A new link for a revision being sent: the token (for the mail only) and its hash (for the row). */
export function newQuoteLink(): { token: string; hash: string; link: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashQuoteToken(token), link: appBaseUrl() + quoteLinkPath(token) };
}

type RevisionRow = typeof quoteRevisions.$inferSelect;

/** Everything the customer's page and its actions read, by the link's token. */
async function findByToken(tx: Db, token: string, { lock = false } = {}) {
  const q = tx
    .select({
      r: quoteRevisions,
      number: quotes.number,
      job: { id: jobs.id, name: jobs.name, customerId: jobs.customerId },
      shop: { id: shops.id, name: shops.name, timeZone: shops.timeZone },
    })
    .from(quoteRevisions)
    .innerJoin(quotes, eq(quotes.id, quoteRevisions.quoteId))
    .innerJoin(jobs, eq(jobs.id, quoteRevisions.jobId))
    .innerJoin(shops, eq(shops.id, quoteRevisions.shopId))
    .where(eq(quoteRevisions.linkTokenHash, hashQuoteToken(token)));
  const [row] = lock ? await q.for('update', { of: quoteRevisions }) : await q;
  // An unknown token and a malformed one read the same: the link does not work (the caller counts the failure).
  if (!row) throw notFoundBecause('This quote link does not work. Check that the whole address was copied, or ask the shop to send it again.');
  const [customer] = row.job.customerId ? await tx.select().from(customers).where(eq(customers.id, row.job.customerId)) : [];
  const [paid] = await tx
    .select({
      n: sql<number>`count(*)`.mapWith(Number),
      paidAt: sql<Date | null>`max(${quotePayments.paidAt})`.mapWith((v) => (v ? new Date(v) : null)),
    })
    .from(quotePayments)
    .where(and(eq(quotePayments.revisionId, row.r.id), eq(quotePayments.status, 'paid')));
  const depositPaid = (paid?.n ?? 0) > 0;
  return { ...row, customer: customer ?? null, depositPaid, depositPaidAt: paid?.paidAt ?? null };
}

type Found = Awaited<ReturnType<typeof findByToken>>;

const stateOf = (f: Found, now: Date): CustomerQuoteState =>
  customerQuoteState({ status: f.r.status, validUntil: f.r.validUntil, depositPaid: f.depositPaid }, shopDay(now, f.shop.timeZone));

function mailFacts(f: Found, link: string): QuoteMailFacts {
  const t = revisionTotals(f.r);
  return {
    shopName: f.shop.name,
    customerName: f.customer?.name || 'there',
    title: `${quoteNumberText(f.number)} rev ${revisionLetter(f.r.revision)}`,
    jobName: f.job.name,
    total: formatMoney(t.totalMinor, f.r.currency),
    deposit: formatMoney(t.depositMinor, f.r.currency),
    noDeposit: t.depositMinor === 0,
    validUntil: f.r.validUntil ?? '',
    link,
  };
}

/** The quote as its customer sees it: prices only (no cost, markup, margin or hours), its state and what they may do. */
export interface CustomerQuote {
  shopName: string;
  title: string;
  jobName: string;
  customerName: string;
  state: CustomerQuoteState;
  /** Why accepting or declining is closed, for the customer; null while they may answer. */
  answerClosed: string | null;
  /** Why paying the deposit is closed; null while they may pay. */
  paymentClosed: string | null;
  revision: Pick<
    RevisionRow,
    'currency' | 'taxPercent' | 'depositPercent' | 'validityDays' | 'terms' | 'validUntil' | 'acceptedName' | 'declineReason'
  >;
  lines: CustomerLine[];
  totals: CustomerTotals;
  answeredAt: string | null;
  depositPaidAt: string | null;
}

export async function customerQuote(db: Db, token: string, now = new Date()): Promise<CustomerQuote> {
  const f = await findByToken(db, token);
  const state = stateOf(f, now);
  const { lines, totals } = customerCopy(f.r.lines, revisionTotals(f.r));
  const when = (d: Date | null) => (d ? formatShopDateTime(d, f.shop.timeZone) : null);
  return {
    shopName: f.shop.name,
    title: `${quoteNumberText(f.number)} rev ${revisionLetter(f.r.revision)}`,
    jobName: f.job.name,
    customerName: f.customer?.name ?? '',
    state,
    answerClosed: refuseAnswer(state),
    paymentClosed: refusePayment(state, totals.depositMinor),
    revision: {
      currency: f.r.currency,
      taxPercent: f.r.taxPercent,
      depositPercent: f.r.depositPercent,
      validityDays: f.r.validityDays,
      terms: f.r.terms,
      validUntil: f.r.validUntil,
      acceptedName: f.r.acceptedName,
      declineReason: f.r.declineReason,
    },
    lines,
    totals,
    answeredAt: when(f.r.answeredAt),
    depositPaidAt: when(f.depositPaidAt),
  };
}

/**
 * The customer accepts (their typed full name and agreement to the terms; time and address recorded) or declines
 * (with a reason). Refused with a sentence for them when the quote is no longer open (409), or expired (410).
 */
export async function answerQuote(db: Db, token: string, answer: QuoteAnswer, from: string, now = new Date()): Promise<CustomerQuote> {
  await db.transaction(async (tx) => {
    const f = await findByToken(tx, token, { lock: true });
    const state = stateOf(f, now);
    const refused = refuseAnswer(state);
    if (refused) throw state === 'expired' ? gone(refused) : conflict(refused);
    const accepted = answer.answer === 'accept';
    await tx
      .update(quoteRevisions)
      .set({
        status: accepted ? 'accepted' : 'declined',
        answeredAt: now,
        answeredFrom: from,
        acceptedName: accepted ? answer.fullName : null,
        declineReason: accepted ? null : answer.reason,
        updatedAt: now,
      })
      .where(eq(quoteRevisions.id, f.r.id));
    if (accepted)
      await tx
        .update(jobs)
        .set({ acceptedAt: sql`coalesce(${jobs.acceptedAt}, ${now.toISOString()}::timestamptz)` })
        .where(eq(jobs.id, f.job.id));
    await recordAudit(tx, {
      shopId: f.shop.id,
      userId: null,
      action: accepted ? 'accept' : 'decline',
      entity: 'quote-revision',
      entityId: f.r.id,
      data: accepted ? { by: answer.fullName, from } : { reason: answer.reason, from },
    });
    await syncJobStatus(
      { db: tx, shopId: f.shop.id, userId: null },
      f.job.id,
      accepted ? 'quote accepted by the customer' : 'quote declined by the customer',
    );
    if (accepted && f.customer?.email) {
      const mail = quoteAcceptedMail({
        ...mailFacts(f, appBaseUrl() + quoteLinkPath(token)),
        acceptedName: answer.fullName,
        acceptedAt: formatShopDateTime(now, f.shop.timeZone),
      });
      await enqueueMail(tx, { shopId: f.shop.id, kind: 'quote-accepted', to: f.customer.email, ...mail });
    }
  });
  return customerQuote(db, token, now);
}

/**
 * Opens a checkout for the deposit of an accepted quote: the amount is the revision's deposit computed here, never
 * a figure from the browser. Returns the payments service's checkout address.
 */
export async function startDepositCheckout(db: Db, stripe: Stripe, token: string, now = new Date()): Promise<{ url: string }> {
  const f = await findByToken(db, token);
  const state = stateOf(f, now);
  const totals = revisionTotals(f.r);
  const refused = refusePayment(state, totals.depositMinor);
  if (refused) throw state === 'expired' ? gone(refused) : conflict(refused);
  const back = appBaseUrl() + quoteLinkPath(token);
  const title = `${quoteNumberText(f.number)} rev ${revisionLetter(f.r.revision)}`;
  const session = await stripe.checkout.sessions.create({
    mode: 'payment',
    line_items: [
      {
        quantity: 1,
        price_data: {
          currency: f.r.currency.toLowerCase(),
          unit_amount: totals.depositMinor,
          product_data: { name: `${f.shop.name}: deposit for ${title}, ${f.job.name}` },
        },
      },
    ],
    client_reference_id: f.r.id,
    ...(f.customer?.email ? { customer_email: f.customer.email } : {}),
    metadata: { shopId: f.shop.id, revisionId: f.r.id },
    success_url: `${back}?checkout={CHECKOUT_SESSION_ID}`,
    cancel_url: `${back}?checkout=cancelled`,
  });
  if (!session.url) throw unavailable('The payments service did not give a checkout address. Try again in a moment.');
  await db.insert(quotePayments).values({
    shopId: f.shop.id,
    revisionId: f.r.id,
    jobId: f.job.id,
    checkoutSessionId: session.id,
    amountMinor: totals.depositMinor,
    currency: f.r.currency,
  });
  return { url: session.url };
}

/** What a payments-service event did here (stored with the event's id, so a replay is answered without a change). */
export type PaymentOutcome = 'paid' | 'already-paid' | 'expired' | 'refunded' | 'partly-refunded' | 'ignored' | 'unknown-session';

/** A checkout session as the events and the SDK carry it (only the fields read here). */
interface SessionFacts {
  id: string;
  payment_status: string;
  amount_total: number | null;
  currency: string | null;
  payment_intent: string | { id: string } | null;
}

/**
 * Records a paid checkout after checking it against the payment row made at checkout time: same amount and same
 * currency as the revision's deposit (422 otherwise, and nothing changes). Idempotent: a second call finds it paid.
 */
async function recordPaid(tx: Db, session: SessionFacts, now: Date): Promise<{ outcome: PaymentOutcome; paymentId: string | null }> {
  const [payment] = await tx.select().from(quotePayments).where(eq(quotePayments.checkoutSessionId, session.id)).for('update');
  if (!payment) return { outcome: 'unknown-session', paymentId: null };
  if (payment.status === 'paid' || payment.status === 'refunded') return { outcome: 'already-paid', paymentId: payment.id };
  if (session.payment_status !== 'paid') return { outcome: 'ignored', paymentId: payment.id };
  const [revision] = await tx.select().from(quoteRevisions).where(eq(quoteRevisions.id, payment.revisionId));
  const deposit = revisionTotals(revision).depositMinor;
  if (
    session.amount_total !== payment.amountMinor ||
    session.amount_total !== deposit ||
    (session.currency ?? '').toLowerCase() !== payment.currency.toLowerCase()
  ) {
    throw invalid(
      `The payment (${session.amount_total ?? '?'} ${session.currency ?? '?'}) does not match the quote's deposit (${deposit} ${payment.currency.toLowerCase()}), so it was not recorded.`,
    );
  }
  const intent = typeof session.payment_intent === 'string' ? session.payment_intent : (session.payment_intent?.id ?? null);
  await tx.update(quotePayments).set({ status: 'paid', paidAt: now, paymentIntentId: intent }).where(eq(quotePayments.id, payment.id));
  await recordAudit(tx, {
    shopId: payment.shopId,
    userId: null,
    action: 'deposit-paid',
    entity: 'quote-revision',
    entityId: revision.id,
    data: { amountMinor: payment.amountMinor, currency: payment.currency, session: session.id },
  });
  await syncJobStatus({ db: tx, shopId: payment.shopId, userId: null }, payment.jobId, 'deposit paid');
  await queueReceipt(tx, payment, revision, now);
  return { outcome: 'paid', paymentId: payment.id };
}

async function queueReceipt(tx: Db, payment: typeof quotePayments.$inferSelect, revision: RevisionRow, now: Date) {
  const [row] = await tx
    .select({ number: quotes.number, jobName: jobs.name, customerId: jobs.customerId, shopName: shops.name, timeZone: shops.timeZone })
    .from(quotes)
    .innerJoin(jobs, eq(jobs.id, quotes.jobId))
    .innerJoin(shops, eq(shops.id, quotes.shopId))
    .where(eq(quotes.id, revision.quoteId));
  const [customer] = row.customerId ? await tx.select().from(customers).where(eq(customers.id, row.customerId)) : [];
  if (!customer?.email) return;
  const t = revisionTotals(revision);
  const money = (m: number) => formatMoney(m, revision.currency);
  const mail = depositReceiptMail({
    shopName: row.shopName,
    customerName: customer.name,
    title: `${quoteNumberText(row.number)} rev ${revisionLetter(revision.revision)}`,
    jobName: row.jobName,
    total: money(t.totalMinor),
    deposit: money(t.depositMinor),
    noDeposit: false,
    paid: money(payment.amountMinor),
    paidAt: formatShopDateTime(now, row.timeZone),
    balance: money(t.balanceMinor),
    reference: payment.checkoutSessionId,
  });
  await enqueueMail(tx, { shopId: payment.shopId, kind: 'deposit-receipt', to: customer.email, ...mail });
}

/**
 * Applies one verified event from the payments service, once: the event's id is stored in the same transaction, so
 * a replay (the service retries, or someone resends a captured event) changes nothing and says so.
 */
export async function applyPaymentEvent(db: Db, event: Stripe.Event, now = new Date()): Promise<{ outcome: PaymentOutcome; replay: boolean }> {
  return db.transaction(async (tx) => {
    const [seen] = await tx.select().from(paymentEvents).where(eq(paymentEvents.id, event.id)).for('update');
    if (seen) return { outcome: seen.outcome as PaymentOutcome, replay: true };
    let result: { outcome: PaymentOutcome; paymentId: string | null } = { outcome: 'ignored', paymentId: null };
    if (event.type === 'checkout.session.completed' || event.type === 'checkout.session.async_payment_succeeded') {
      result = await recordPaid(tx, event.data.object, now);
    } else if (event.type === 'checkout.session.expired') {
      const [payment] = await tx.select().from(quotePayments).where(eq(quotePayments.checkoutSessionId, event.data.object.id)).for('update');
      if (payment?.status === 'open') await tx.update(quotePayments).set({ status: 'expired' }).where(eq(quotePayments.id, payment.id));
      result = { outcome: payment ? 'expired' : 'unknown-session', paymentId: payment?.id ?? null };
    } else if (event.type === 'charge.refunded') {
      const charge = event.data.object;
      const intent = typeof charge.payment_intent === 'string' ? charge.payment_intent : (charge.payment_intent?.id ?? null);
      const [payment] = intent ? await tx.select().from(quotePayments).where(eq(quotePayments.paymentIntentId, intent)).for('update') : [];
      if (!payment) result = { outcome: 'unknown-session', paymentId: null };
      else if (charge.amount_refunded >= payment.amountMinor) {
        await tx.update(quotePayments).set({ status: 'refunded', refundedAt: now }).where(eq(quotePayments.id, payment.id));
        await recordAudit(tx, {
          shopId: payment.shopId,
          userId: null,
          action: 'deposit-refunded',
          entity: 'quote-revision',
          entityId: payment.revisionId,
          data: { amountMinor: charge.amount_refunded },
        });
        await syncJobStatus({ db: tx, shopId: payment.shopId, userId: null }, payment.jobId, 'deposit refunded');
        result = { outcome: 'refunded', paymentId: payment.id };
      } else {
        // Part of the deposit went back: the job keeps its deposit; the audit keeps the refund.
        await recordAudit(tx, {
          shopId: payment.shopId,
          userId: null,
          action: 'deposit-part-refunded',
          entity: 'quote-revision',
          entityId: payment.revisionId,
          data: { amountMinor: charge.amount_refunded },
        });
        result = { outcome: 'partly-refunded', paymentId: payment.id };
      }
    }
    await tx.insert(paymentEvents).values({ id: event.id, type: event.type, paymentId: result.paymentId, outcome: result.outcome });
    return { outcome: result.outcome, replay: false };
  });
}

/**
 * The customer is back from the checkout: read the session from the payments service and record it if paid (the
 * webhook may not have arrived yet; whichever comes first records it, the other finds it done).
 */
export async function reconcileCheckout(db: Db, stripe: Stripe, token: string, sessionId: string, now = new Date()): Promise<void> {
  const f = await findByToken(db, token);
  const [payment] = await db
    .select()
    .from(quotePayments)
    .where(and(eq(quotePayments.checkoutSessionId, sessionId), eq(quotePayments.revisionId, f.r.id)));
  if (!payment || payment.status !== 'open') return;
  const session = await stripe.checkout.sessions.retrieve(sessionId);
  if (session.payment_status !== 'paid') return;
  await db.transaction((tx) => recordPaid(tx, session, now));
}

/**
 * Quotes sent and left unanswered past their last valid day (in each shop's time zone) become expired, and their
 * jobs follow. Run now and then by the server (server/quotes/expiry.ts); the customer's page reads a quote past its
 * day as expired even before that.
 */
export async function expireQuotes(db: Db, now = new Date()): Promise<number> {
  return db.transaction(async (tx) => {
    const due = await tx
      .select({
        id: quoteRevisions.id,
        shopId: quoteRevisions.shopId,
        jobId: quoteRevisions.jobId,
        validUntil: quoteRevisions.validUntil,
        timeZone: shops.timeZone,
      })
      .from(quoteRevisions)
      .innerJoin(shops, eq(shops.id, quoteRevisions.shopId))
      .where(
        and(
          eq(quoteRevisions.status, 'sent'),
          lt(quoteRevisions.validUntil, sql`(${now.toISOString()}::timestamptz at time zone ${shops.timeZone})::date`),
        ),
      )
      .for('update', { of: quoteRevisions });
    if (due.length === 0) return 0;
    await tx
      .update(quoteRevisions)
      .set({ status: 'expired', updatedAt: now })
      .where(
        inArray(
          quoteRevisions.id,
          due.map((d) => d.id),
        ),
      );
    for (const d of due)
      await recordAudit(tx, {
        shopId: d.shopId,
        userId: null,
        action: 'expire',
        entity: 'quote-revision',
        entityId: d.id,
        data: { validUntil: d.validUntil },
      });
    for (const jobId of new Set(due.map((d) => d.jobId))) {
      const shopId = due.find((d) => d.jobId === jobId)!.shopId;
      await syncJobStatus({ db: tx, shopId, userId: null }, jobId, 'quote expired');
    }
    return due.length;
  });
}

/** A revision the customer answered may not be replaced by a newer one sent: the shop makes a new quote instead. */
export function refuseNewRevisionAfter(status: RevisionRow['status'], revision: number) {
  if (status === 'accepted')
    throw conflict(
      `Rev ${revisionLetter(revision)} was accepted by the customer: make a new quote for any change, so what they agreed to stays as it was.`,
    );
}

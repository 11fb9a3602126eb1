import type { Scope, ShopScope } from '../scope';
import type { QuoteRevisionView } from '@/shared/wire/quotes';
import { and, desc, eq, ne, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { jobs, parts, plans, quoteRevisions, quotes, shops } from '../schema';
import { quoteTotals, type QuoteTotals } from '@/lib/costing/quote-totals';
import { boxFromOpening } from '@/lib/joinery/box-from-opening';
import { requiredSetupCards, SETUP_CARD_TOLERANCE_MM } from '@/lib/joinery/setup-cards';
import { planTotals } from '@/lib/nesting/figures';
import { readPlan } from '@/lib/nesting';
import { buildQuoteLines, type SlideNeed } from '@/lib/quotes/build-lines';
import { quoteLength, quoteNominal } from '@/lib/quotes/quote-text';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { quoteNumberText, revisionLetter, type QuoteLine, type QuoteRevisionPatch } from '@/shared/schemas/quote';
import { formatMoney } from '@/lib/costing/money';
import { shopDay } from '@/lib/dates/shop-time';
import { enqueueMail } from '@/server/mail/outbox';
import { quoteMail } from '@/lib/mail/templates';
import { lastValidDay } from '@/lib/quotes/answer';
import { quotePdf, type QuotePdfInput } from '@/lib/quotes/quote-pdf';
import { pdfFileName } from '@/lib/saw-order/pdf-text';
import { recordAudit } from './audit';
import { customerOfJob } from './customers';
import { getJob } from './jobs';
import { newQuoteLink, refuseNewRevisionAfter } from './quote-answers';
import { listDrawerSchedules } from './drawer-schedules';
import { syncJobStatus } from './job-status';
import { getPricing, listHardware, type PricingView } from './pricing';
import { getShopSettings } from './shops';
import { getTakeoff } from './takeoff';
import { invalid, notFound, conflict } from '@/lib/errors';

type RevisionRow = typeof quoteRevisions.$inferSelect;

export type { QuoteRevisionView };

/** A revision's totals, by the rules of lib/costing/RULES.md. */
export function revisionTotals(
  r: Pick<RevisionRow, 'currency' | 'lines' | 'markupMaterialPercent' | 'markupHardwarePercent' | 'discount' | 'taxPercent' | 'depositPercent'>,
): QuoteTotals {
  return quoteTotals({
    currency: r.currency,
    lines: r.lines,
    markupPercent: { material: r.markupMaterialPercent, hardware: r.markupHardwarePercent },
    discount: r.discount,
    taxPercent: r.taxPercent,
    depositPercent: r.depositPercent,
  });
}

function toView(r: RevisionRow, number: number, latestRevision: number, depositPaidAt: Date | null = null): QuoteRevisionView {
  return {
    id: r.id,
    quoteId: r.quoteId,
    jobId: r.jobId,
    title: `${quoteNumberText(number)} rev ${revisionLetter(r.revision)}`,
    number: quoteNumberText(number),
    revision: revisionLetter(r.revision),
    status: r.status,
    latest: r.revision === latestRevision,
    planId: r.planId,
    currency: r.currency,
    lines: r.lines,
    markupMaterialPercent: r.markupMaterialPercent,
    markupHardwarePercent: r.markupHardwarePercent,
    discount: r.discount,
    taxPercent: r.taxPercent,
    depositPercent: r.depositPercent,
    validityDays: r.validityDays,
    terms: r.terms,
    sentAt: r.sentAt?.toISOString() ?? null,
    validUntil: r.validUntil,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
    answeredAt: r.answeredAt?.toISOString() ?? null,
    acceptedName: r.acceptedName,
    declineReason: r.declineReason,
    depositPaidAt: depositPaidAt?.toISOString() ?? null,
    totals: revisionTotals(r),
  };
}

/** When the revision's deposit was paid (a paid, not refunded, payment), or null. */
const depositPaidAt =
  sql<Date | null>`(select max(p.paid_at) from "quote_payments" p where p.revision_id = ${quoteRevisions.id} and p.status = 'paid')`.mapWith((v) =>
    v ? new Date(v) : null,
  );

const latestOf = (tx: Db, quoteId: string) =>
  tx
    .select({ n: sql<number>`max(${quoteRevisions.revision})`.mapWith(Number) })
    .from(quoteRevisions)
    .where(eq(quoteRevisions.quoteId, quoteId));

export async function getRevision({ db, shopId }: ShopScope, revisionId: string): Promise<QuoteRevisionView> {
  const [row] = await db
    .select({ r: quoteRevisions, number: quotes.number, paidAt: depositPaidAt })
    .from(quoteRevisions)
    .innerJoin(quotes, eq(quotes.id, quoteRevisions.quoteId))
    .where(and(eq(quoteRevisions.shopId, shopId), eq(quoteRevisions.id, revisionId)));
  if (!row) throw notFound('That quote');
  const [latest] = await latestOf(db, row.r.quoteId);
  return toView(row.r, row.number, latest.n, row.paidAt);
}

/** Every revision of a job's quotes, newest quote first and its latest revision first. */
export async function listJobQuotes({ db, shopId }: ShopScope, jobId: string): Promise<QuoteRevisionView[]> {
  const rows = await db
    .select({ r: quoteRevisions, number: quotes.number, paidAt: depositPaidAt })
    .from(quoteRevisions)
    .innerJoin(quotes, eq(quotes.id, quoteRevisions.quoteId))
    .where(and(eq(quoteRevisions.shopId, shopId), eq(quoteRevisions.jobId, jobId)))
    .orderBy(desc(quotes.number), desc(quoteRevisions.revision));
  const latest = new Map<string, number>();
  for (const { r } of rows) latest.set(r.quoteId, Math.max(latest.get(r.quoteId) ?? 0, r.revision));
  return rows.map(({ r, number, paidAt }) => toView(r, number, latest.get(r.quoteId)!, paidAt));
}

/** The customer's quotes: the latest revision of each quote on any of their jobs. */
export async function listCustomerQuotes({ db, shopId }: ShopScope, customerId: string) {
  const rows = await db
    .select({ r: quoteRevisions, number: quotes.number, jobName: jobs.name, paidAt: depositPaidAt })
    .from(quoteRevisions)
    .innerJoin(quotes, eq(quotes.id, quoteRevisions.quoteId))
    .innerJoin(jobs, eq(jobs.id, quoteRevisions.jobId))
    .where(
      and(
        eq(quoteRevisions.shopId, shopId),
        eq(jobs.customerId, customerId),
        sql`${quoteRevisions.revision} = (select max(r2.revision) from "quote_revisions" r2 where r2.quote_id = ${quoteRevisions.quoteId})`,
      ),
    )
    .orderBy(desc(quotes.number));
  return rows.map(({ r, number, jobName, paidAt }) => ({ ...toView(r, number, r.revision, paidAt), jobName }));
}

/** Pairs of slides by kind and length, setup cards, boxes and joint corners from the job's drawer schedules. */
async function drawerFacts(db: Db, shopId: string, jobId: string, describe: (mm: number) => string) {
  const schedules = await listDrawerSchedules({ db, shopId }, jobId);
  const slides = new Map<string, SlideNeed>();
  const cards: { joint: string; stockThickness: number }[] = [];
  let boxes = 0;
  for (const saved of schedules) {
    const s = drawerScheduleSchema.safeParse(saved.input);
    if (!s.success) continue;
    boxes += s.data.quantity;
    for (const key of requiredSetupCards(s.data)) {
      if (!cards.some((c) => c.joint === key.joint && Math.abs(c.stockThickness - key.stockThickness) <= SETUP_CARD_TOLERANCE_MM)) cards.push(key);
    }
    const box = boxFromOpening(s.data);
    if (!box.ok || box.slideLength === null || s.data.slide.type === 'none' || s.data.slide.type === 'wooden-runners') continue;
    const kind = s.data.slide.model?.name ?? (s.data.slide.type === 'side-mount' ? 'Side-mount slides' : 'Undermount slides');
    const key = `${kind}|${box.slideLength}`;
    const need = slides.get(key) ?? { kind, length: box.slideLength, lengthText: describe(box.slideLength), pairs: 0 };
    need.pairs += s.data.quantity;
    slides.set(key, need);
  }
  // A drawer box has four corners (two at the front, two at the back): common practice, no source.
  return { slides: [...slides.values()], setupCards: cards.length, drawerBoxes: boxes, jointCorners: boxes * 4 };
}

/** Makes a job's new quote (the shop's next number, rev A) with lines built from the job and, if named, one of its plans. */
export async function createQuote(scope: Scope, jobId: string, planId: string | null): Promise<QuoteRevisionView> {
  await refuseForeignPlan(scope, jobId, planId);
  const { lines, priced } = await draftQuoteLines(scope, jobId, planId);
  const id = await insertQuote(scope, { jobId, planId, lines, ...priced });
  return getRevision(scope, id);
}

/** A quote is for a job of the shop, priced from one of that job's plans (not a cancelled one), or from none. */
async function refuseForeignPlan({ db, shopId }: ShopScope, jobId: string, planId: string | null) {
  const [job] = await db
    .select({ id: jobs.id })
    .from(jobs)
    .where(and(eq(jobs.shopId, shopId), eq(jobs.id, jobId)));
  if (!job) throw notFound('That job');
  if (!planId) return;
  const [plan] = await db
    .select({ id: plans.id })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.jobId, jobId), eq(plans.id, planId), ne(plans.status, 'cancelled')));
  if (!plan) throw invalid('That plan is not one of this job’s (or it was cancelled).', { planId: ['Pick one of the job’s plans.'] });
}

/** The first draft's lines (the plan's takeoff, the drawer schedules' hardware and labour counts) and the shop's prices they use. */
async function draftQuoteLines(scope: ShopScope, jobId: string, planId: string | null) {
  const { db, shopId } = scope;
  const [settings, priced, hardware] = await Promise.all([getShopSettings(scope), getPricing(scope), listHardware(scope)]);
  const { pricing } = priced;
  const describe = (mm: number) => quoteLength(mm, settings.units);
  const [takeoff, drawers, [faces], plan] = await Promise.all([
    planId ? getTakeoff(scope, jobId, planId) : null,
    drawerFacts(db, shopId, jobId, describe),
    db
      .select({ mm2: sql<number>`coalesce(sum(2 * ${parts.length} * ${parts.width} * ${parts.quantity}), 0)`.mapWith(Number) })
      .from(parts)
      .where(and(eq(parts.shopId, shopId), eq(parts.jobId, jobId))),
    planId ? db.select({ document: plans.document }).from(plans).where(eq(plans.id, planId)) : [],
  ]);
  const { cuts, pieces: piecesHandled } = plan[0] ? planTotals(readPlan(plan[0].document).pieces) : { cuts: 0, pieces: 0 };
  const lines = buildQuoteLines({
    takeoff: takeoff
      ? { lines: [...takeoff.pull, ...takeoff.buy], allowancePercent: takeoff.allowancePercent, allowanceCents: takeoff.totals.allowanceCents }
      : null,
    slides: drawers.slides,
    // Both faces of every part in the cut list.
    counts: {
      cuts,
      piecesHandled,
      setupCards: drawers.setupCards,
      jointCorners: drawers.jointCorners,
      drawerBoxes: drawers.drawerBoxes,
      faceAreaMm2: faces?.mm2 ?? 0,
    },
    pricing,
    hardware,
    describeSize: (t) =>
      `${t.material} ${t.nominalThickness ? quoteNominal(t.nominalThickness) : describe(t.thickness)}, ${describe(t.length)} × ${describe(t.width)}`,
  });
  return { lines, priced };
}

/** Numbers the quote (the next of the shop's) and stores its revision 0 with the shop's current terms. */
async function insertQuote(
  { db, shopId, userId }: Scope,
  { jobId, planId, lines, pricing, currency }: { jobId: string; planId: string | null; lines: QuoteLine[] } & PricingView,
): Promise<string> {
  return db.transaction(async (tx) => {
    // The shop row is locked so two quotes made at once never take one number.
    await tx.select({ id: shops.id }).from(shops).where(eq(shops.id, shopId)).for('update');
    const [{ next }] = await tx
      .select({ next: sql<number>`coalesce(max(${quotes.number}), 0) + 1`.mapWith(Number) })
      .from(quotes)
      .where(eq(quotes.shopId, shopId));
    const [quote] = await tx.insert(quotes).values({ shopId, jobId, number: next }).returning();
    const [rev] = await tx
      .insert(quoteRevisions)
      .values({
        shopId,
        quoteId: quote.id,
        jobId,
        revision: 0,
        planId,
        currency,
        lines,
        markupMaterialPercent: pricing.markupPercent.material,
        markupHardwarePercent: pricing.markupPercent.hardware,
        discount: { kind: 'percent', percent: 0 },
        taxPercent: pricing.taxPercent,
        depositPercent: pricing.depositPercent,
        validityDays: pricing.validityDays,
        terms: pricing.terms,
        createdBy: userId,
      })
      .returning({ id: quoteRevisions.id });
    await recordAudit(tx, {
      shopId,
      userId,
      action: 'create',
      entity: 'quote',
      entityId: quote.id,
      data: { number: next, jobId, planId, lines: lines.length },
    });
    return rev.id;
  });
}

/** Locks a revision of this shop for a change. */
async function lockRevision(tx: Db, shopId: string, revisionId: string) {
  const [row] = await tx
    .select()
    .from(quoteRevisions)
    .where(and(eq(quoteRevisions.shopId, shopId), eq(quoteRevisions.id, revisionId)))
    .for('update');
  if (!row) throw notFound('That quote');
  return row;
}

/** Changes a draft's lines and figures; a sent or replaced revision is kept as it was sent (409: make a new revision). */
export async function updateRevision({ db, shopId, userId }: Scope, revisionId: string, patch: QuoteRevisionPatch): Promise<QuoteRevisionView> {
  await db.transaction(async (tx) => {
    const row = await lockRevision(tx, shopId, revisionId);
    if (row.status !== 'draft') throw conflict('This revision was sent and stays as the customer has it: make a new revision to change it.');
    const next = { ...row, ...Object.fromEntries(Object.entries(patch).filter(([, v]) => v !== undefined)) } as RevisionRow;
    if (new Set(next.lines.map((l) => l.id)).size !== next.lines.length)
      throw invalid('Two lines share an id.', { lines: ['Each line needs its own id.'] });
    try {
      revisionTotals(next);
    } catch (e) {
      if (e instanceof RangeError) throw invalid(e.message, { _: [e.message] });
      throw e;
    }
    await tx
      .update(quoteRevisions)
      .set({ ...patch, updatedAt: new Date() })
      .where(eq(quoteRevisions.id, revisionId));
    await recordAudit(tx, { shopId, userId, action: 'update', entity: 'quote-revision', entityId: revisionId, data: { fields: Object.keys(patch) } });
  });
  return getRevision({ db, shopId }, revisionId);
}

/** A new revision (B after A…) copied from the latest one, as a draft; refused while the latest is still a draft. */
export async function newRevision({ db, shopId, userId }: Scope, quoteId: string): Promise<QuoteRevisionView> {
  const id = await db.transaction(async (tx) => {
    const [quote] = await tx
      .select()
      .from(quotes)
      .where(and(eq(quotes.shopId, shopId), eq(quotes.id, quoteId)))
      .for('update');
    if (!quote) throw notFound('That quote');
    const [latest] = await tx
      .select()
      .from(quoteRevisions)
      .where(eq(quoteRevisions.quoteId, quoteId))
      .orderBy(desc(quoteRevisions.revision))
      .limit(1);
    if (latest.status === 'draft') throw conflict(`Rev ${revisionLetter(latest.revision)} is still a draft: change it instead of making another.`);
    refuseNewRevisionAfter(latest.status, latest.revision);
    const {
      id: _id,
      createdAt: _c,
      updatedAt: _u,
      sentAt: _s,
      status: _st,
      linkTokenHash: _l,
      validUntil: _v,
      answeredAt: _a,
      acceptedName: _n,
      answeredFrom: _f,
      declineReason: _d,
      ...copy
    } = latest;
    const [rev] = await tx
      .insert(quoteRevisions)
      .values({ ...copy, revision: latest.revision + 1, status: 'draft', createdBy: userId })
      .returning({ id: quoteRevisions.id });
    await recordAudit(tx, {
      shopId,
      userId,
      action: 'create',
      entity: 'quote-revision',
      entityId: rev.id,
      data: { quoteId, revision: revisionLetter(latest.revision + 1) },
    });
    return rev.id;
  });
  return getRevision({ db, shopId }, id);
}

/**
 * Sends the latest revision to the job's customer: the quote mail (the PDF attached, and the link to their page) is
 * queued in the same transaction that marks it sent; an earlier sent revision is replaced (its link then says so),
 * and a job still quoting becomes quoted. Only the latest revision can be sent, only once, and only to a customer
 * with an e-mail address. The caller wakes the mail sender.
 */
export async function sendRevision(scope: Scope, revisionId: string, now = new Date()): Promise<QuoteRevisionView> {
  const { db, shopId, userId } = scope;
  const revision = await getRevision(scope, revisionId);
  const [job, settings] = await Promise.all([getJob(scope, revision.jobId), getShopSettings(scope)]);
  const customer = await quoteRecipient(scope, job);
  const link = newQuoteLink();
  const sentDay = shopDay(now, settings.timeZone);
  const validUntil = lastValidDay(sentDay, revision.validityDays);
  const pdf = await quotePdf({ ...quotePdfInput(revision, job, customer, settings), issued: sentDay, validUntil, customerLink: link.link });

  await db.transaction(async (tx) => {
    const row = await lockRevision(tx, shopId, revisionId);
    await refuseUnsendable(tx, row, revision);
    const replaced = await tx
      .update(quoteRevisions)
      .set({ status: 'replaced', updatedAt: now })
      .where(and(eq(quoteRevisions.quoteId, row.quoteId), eq(quoteRevisions.status, 'sent')))
      .returning({ revision: quoteRevisions.revision });
    await tx
      .update(quoteRevisions)
      .set({ status: 'sent', sentAt: now, validUntil, linkTokenHash: link.hash, updatedAt: now })
      .where(eq(quoteRevisions.id, revisionId));
    const mail = quoteMail({
      shopName: settings.name,
      customerName: customer.name,
      title: revision.title,
      jobName: job.name,
      total: formatMoney(revision.totals.totalMinor, revision.currency),
      deposit: formatMoney(revision.totals.depositMinor, revision.currency),
      noDeposit: revision.totals.depositMinor === 0,
      validUntil,
      link: link.link,
      replaces: replaced.length ? replaced.map((r) => `rev ${revisionLetter(r.revision)}`).join(', ') : null,
    });
    const filename = `${pdfFileName(`${revision.title} ${job.name}`)}.pdf`;
    await enqueueMail(tx, {
      shopId,
      kind: 'quote',
      to: customer.email,
      ...mail,
      attachments: [{ filename, contentType: 'application/pdf', content: pdf.toString('base64') }],
    });
    const data = { total: revision.totals.totalMinor, to: customer.email, validUntil };
    await recordAudit(tx, { shopId, userId, action: 'send', entity: 'quote-revision', entityId: revisionId, data });
    await syncJobStatus({ db: tx, shopId, userId }, row.jobId, 'quote sent');
  });
  return getRevision(scope, revisionId);
}

/** The customer a quote goes to: the job's, with an e-mail address (422 naming what to add otherwise). */
async function quoteRecipient(scope: ShopScope, job: { customerId: string | null }) {
  const customer = await customerOfJob(scope, job);
  if (!customer)
    throw invalid('The job has no customer to send the quote to: pick one on the job first.', { customer: ['Pick the customer this quote is for.'] });
  if (!customer.email)
    throw invalid(`${customer.name} has no e-mail address: add it on their customer page, then send.`, {
      email: [`Add ${customer.name}’s e-mail address.`],
    });
  return customer;
}

/** Only the latest revision, still a draft, unchanged since it was read, with at least one line, can be sent. */
async function refuseUnsendable(tx: Db, row: RevisionRow, read: QuoteRevisionView) {
  const [latest] = await latestOf(tx, row.quoteId);
  if (row.revision !== latest.n)
    throw conflict(
      `Only the latest revision can be sent: this is rev ${revisionLetter(row.revision)}, the latest is rev ${revisionLetter(latest.n)}.`,
    );
  if (row.status !== 'draft') throw conflict('This revision was already sent.');
  if (row.updatedAt.toISOString() !== read.updatedAt)
    throw conflict('This revision changed while it was being sent: look it over and send it again.');
  if (row.lines.length === 0) throw invalid('A quote with no lines cannot be sent.');
}

/** What the quote PDF prints for a revision (the customer's copy: prices only). */
export function quotePdfInput(
  revision: QuoteRevisionView,
  job: { name: string },
  customer: QuotePdfInput['customer'],
  shop: { name: string; units: { system: string } },
): QuotePdfInput {
  return {
    shop: { name: shop.name },
    title: revision.title,
    issued: (revision.sentAt ?? revision.createdAt).slice(0, 10),
    validUntil: revision.validUntil,
    validityDays: revision.validityDays,
    customer,
    jobName: job.name,
    currency: revision.currency,
    lines: revision.lines,
    totals: revision.totals,
    taxPercent: revision.taxPercent,
    depositPercent: revision.depositPercent,
    terms: revision.terms,
    // The customer's link lives only in the mail sent to them (the database keeps its hash): a copy printed later has none.
    customerLink: null,
    pageSize: shop.units.system === 'metric' ? 'A4' : 'LETTER',
  };
}

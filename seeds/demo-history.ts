/**
 * Six months of the demo shop's past work, so the reports have something to show: six invented jobs, each nested
 * by the real engine, released and finished through the stock room's own functions, then dated back to the day it
 * was cut. Their sheets come from the rack as far as its free count goes (its opening counts are dated before them)
 * and are bought for the rest; their
 * offcuts go on the rack and are used by the next job or thrown out, and one part was damaged at the saw. Each was won
 * by a quote its customer accepted online (the deposit paid); two other quotes were declined or ran out.
 */
import { and, eq, inArray } from 'drizzle-orm';
import type { Db } from '@/db/open';
import { buildNestRequest, stockRef } from '@/db/queries/nest-request';
import { finishPlan, releasePlan } from '@/db/queries/plan-lifecycle';
import { createQuote, revisionTotals } from '@/db/queries/quotes';
import { customers, jobs, offcuts, parts, plans, quotePayments, quoteRevisions, quotes, recuts, stockMovements } from '@/db/schema';
import { optimize } from '@/lib/nesting';
import { inches } from '@/lib/units/length';
import { nestRequestSchema } from '@/shared/schemas/nesting';

const MAPLE = { material: 'Maple ply', thickness: inches(23 / 32) };
const BIRCH_12 = { material: 'Baltic birch', thickness: 12 };
const BIRCH_6 = { material: 'Baltic birch', thickness: 6 };
const part = (
  label: string,
  quantity: number,
  l: number,
  w: number,
  stock: { material: string; thickness: number },
  grain: 'along-length' | 'any' = 'along-length',
) => ({
  label,
  quantity,
  length: inches(l),
  width: inches(w),
  ...stock,
  grain,
});

/** When each was finished (UTC) and who it was for. The last one ends at 23:30 on a Thursday evening in Chicago. */
const PAST_JOBS = [
  {
    name: 'Marsh Creek pantry',
    plan: 'Pantry carcasses and shelves',
    customer: 'Dana Marsh',
    finishedAt: '2026-06-18T21:40:00Z',
    parts: [part('Pantry side', 4, 84, 23.25, MAPLE), part('Shelf', 10, 22.5, 22, MAPLE, 'any'), part('Top and bottom', 4, 22.5, 23.25, MAPLE)],
  },
  {
    name: 'Quill & Co. coffee counter',
    plan: 'Counter and drawers',
    customer: 'Quill & Co.',
    finishedAt: '2026-07-23T19:15:00Z',
    parts: [
      part('Counter side', 3, 34.5, 24, MAPLE),
      part('Bottom', 2, 46, 24, MAPLE),
      part('Drawer side', 8, 22, 5.5, BIRCH_12),
      part('Drawer bottom', 4, 21.5, 14.5, BIRCH_6, 'any'),
    ],
  },
  {
    name: 'Ostrander bath vanity',
    plan: 'Vanity carcass',
    customer: 'Lena Ostrander',
    finishedAt: '2026-08-27T22:05:00Z',
    parts: [part('Vanity side', 2, 30, 21, MAPLE), part('Vanity bottom', 1, 46.5, 21, MAPLE), part('Stretcher', 3, 46.5, 4, MAPLE, 'any')],
    damaged: 'Vanity side',
  },
  {
    name: 'Bellweather mudroom lockers',
    plan: 'Lockers and bench',
    customer: 'Ruth Bellweather',
    finishedAt: '2026-09-24T20:30:00Z',
    parts: [part('Locker side', 5, 72, 16, MAPLE), part('Locker shelf', 8, 18, 16, MAPLE, 'any'), part('Bench top', 1, 72, 16, MAPLE)],
  },
  {
    name: 'Tamsin office built-ins',
    plan: 'Bookcases and desk top',
    customer: 'Tamsin Reyes',
    finishedAt: '2026-10-29T18:45:00Z',
    parts: [part('Bookcase side', 6, 84, 12, MAPLE), part('Bookcase shelf', 12, 34.5, 11.5, MAPLE, 'any'), part('Desk top', 1, 60, 24, MAPLE)],
  },
  {
    name: 'Ferncliff drawer bank',
    plan: 'Drawer boxes',
    customer: 'Omar Ferncliff',
    finishedAt: '2026-11-20T05:30:00Z',
    parts: [
      part('Drawer side', 16, 20, 6, BIRCH_12),
      part('Drawer front and back', 16, 14, 6, BIRCH_12),
      part('Drawer bottom', 8, 19.5, 13.5, BIRCH_6, 'any'),
    ],
  },
] as const;

/** The rack location where the past jobs' offcuts were put. */
export const HISTORY_BIN = 'Offcut bin 6';

/** When the rack's opening counts were taken: before the first past job, so the stock history never runs below zero. */
const OPENING_COUNT_AT = new Date('2026-05-29T14:00:00Z');

export async function seedDemoHistory(db: Db, { shopId, estimatorId, cutterId }: { shopId: string; estimatorId: string; cutterId: string }) {
  // The past jobs cut sheets from the rack as they found it; the counts they found were taken before them.
  await db
    .update(stockMovements)
    .set({ createdAt: OPENING_COUNT_AT })
    .where(and(eq(stockMovements.shopId, shopId), eq(stockMovements.reason, 'Opening count')));
  const racked: string[] = [];
  for (const past of PAST_JOBS) {
    const at = new Date(past.finishedAt);
    const acceptedAt = new Date(at.getTime() - 12 * 86_400_000);
    const [customer] = await db
      .insert(customers)
      .values({ shopId, name: past.customer, createdAt: acceptedAt, updatedAt: acceptedAt })
      .returning({ id: customers.id });
    const [job] = await db
      .insert(jobs)
      .values({ shopId, name: past.name, customerId: customer.id, status: 'accepted', acceptedAt, createdBy: estimatorId, createdAt: acceptedAt })
      .returning({ id: jobs.id });
    await db.insert(parts).values(past.parts.map((p, sort) => ({ shopId, jobId: job.id, sort: sort + 1, ...p })));

    // Bought for the job, or cut from what earlier past jobs racked: today's rack and counts are not touched.
    // Only offcuts of a good size were kept in those days (at least 24″ × 12″), so the rack did not fill with scraps.
    const built = nestRequestSchema.parse(
      await buildNestRequest({ db, shopId }, job.id, { timeBudgetMs: 0, minOffcutLength: inches(24), minOffcutWidth: inches(12) }),
    );
    const request = { ...built, stock: built.stock.filter((s) => s.count === null || racked.some((id) => s.id === stockRef.offcut(id))) };
    const document = await optimize(request);
    const [plan] = await db
      .insert(plans)
      .values({
        shopId,
        jobId: job.id,
        name: past.plan,
        status: 'draft',
        request,
        version: document.version,
        document,
        yieldRatio: document.totals?.yield ?? null,
        costCents: Math.round(document.totals?.cost ?? 0),
        createdBy: estimatorId,
        createdAt: acceptedAt,
      })
      .returning({ id: plans.id });
    // The quote that won the job, priced from this plan: sent four days before the customer accepted it online, the
    // deposit paid the next day.
    await pastQuote(db, {
      shopId,
      userId: estimatorId,
      jobId: job.id,
      planId: plan.id,
      sentAt: new Date(acceptedAt.getTime() - 4 * 86_400_000),
      answer: { status: 'accepted', at: acceptedAt, by: past.customer },
    });
    await releasePlan({ db, shopId, userId: estimatorId }, plan.id);

    const damagedLabel = 'damaged' in past ? past.damaged : undefined;
    const damaged = damagedLabel
      ? document.pieces
          .flatMap((piece, index) =>
            piece.placements
              .filter((pl) => pl.label.startsWith(damagedLabel))
              .map((pl) => ({ piece: index, partId: pl.partId, instance: pl.instance, reason: 'Chipped the veneer on the crosscut' })),
          )
          .slice(0, 1)
      : [];
    await finishPlan({ db, shopId, userId: cutterId }, plan.id, { damaged });

    // Dated back to the day it was cut.
    await db
      .update(plans)
      .set({ releasedAt: new Date(at.getTime() - 2 * 86_400_000), finishedAt: at, updatedAt: at })
      .where(eq(plans.id, plan.id));
    await db.update(stockMovements).set({ createdAt: at }).where(eq(stockMovements.planId, plan.id));
    const kept = await db
      .update(offcuts)
      .set({ createdAt: at, location: HISTORY_BIN })
      .where(eq(offcuts.sourcePlanId, plan.id))
      .returning({ id: offcuts.id });
    racked.push(...kept.map((o) => o.id));
    // The damaged part was re-cut by hand from the job's spare the same day.
    await db
      .update(recuts)
      .set({ status: 'cancelled', cancelReason: 'Cut again from the spare by hand the same day' })
      .where(and(eq(recuts.shopId, shopId), eq(recuts.jobId, job.id)));
    await db.update(jobs).set({ status: 'done', updatedAt: at }).where(eq(jobs.id, job.id));
  }

  // What is left of the past jobs' offcuts was thrown out at the end of November, but for one the rack still holds.
  const left = await db
    .select({ id: offcuts.id, createdAt: offcuts.createdAt })
    .from(offcuts)
    .where(and(eq(offcuts.shopId, shopId), eq(offcuts.status, 'available'), eq(offcuts.location, HISTORY_BIN)));
  const [oldest, ...rest] = [...left].sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime() || a.id.localeCompare(b.id));
  if (rest.length) {
    const at = new Date('2026-11-27T22:00:00Z');
    await db
      .update(offcuts)
      .set({ status: 'scrapped' })
      .where(
        inArray(
          offcuts.id,
          rest.map((o) => o.id),
        ),
      );
    await db.insert(stockMovements).values(
      rest.map((o) => ({
        shopId,
        kind: 'scrapped' as const,
        offcutId: o.id,
        quantity: -1,
        userId: cutterId,
        reason: 'Rack clear-out',
        createdAt: at,
      })),
    );
  }

  // Two quotes that did not win: one declined, one left to run out.
  for (const lost of LOST_QUOTES) {
    const sentAt = new Date(lost.sentAt);
    const [customer] = await db
      .insert(customers)
      .values({ shopId, name: lost.customer, createdAt: sentAt, updatedAt: sentAt })
      .returning({ id: customers.id });
    const [job] = await db
      .insert(jobs)
      .values({ shopId, name: lost.name, customerId: customer.id, status: lost.status, createdBy: estimatorId, createdAt: sentAt, updatedAt: sentAt })
      .returning({ id: jobs.id });
    const answer =
      lost.status === 'declined'
        ? { status: 'declined' as const, at: new Date(lost.answeredAt!), reason: lost.reason }
        : { status: 'expired' as const };
    await pastQuote(db, { shopId, userId: estimatorId, jobId: job.id, planId: null, sentAt, answer, line: lost.line });
  }
  return { jobs: PAST_JOBS.length, oldOffcut: oldest?.id ?? null };
}

const LOST_QUOTES = [
  {
    name: 'Harrow porch bench',
    customer: 'Nell Harrow',
    status: 'declined',
    sentAt: '2026-09-02T16:00:00Z',
    answeredAt: '2026-09-09T01:20:00Z',
    reason: 'We found one ready-made.',
    line: { description: 'Porch bench, white oak, oiled', unitCostMinor: 118_000 },
  },
  {
    name: 'Linden wine rack',
    customer: 'Cyril Linden',
    status: 'expired',
    sentAt: '2026-10-01T15:30:00Z',
    line: { description: 'Wine rack, 48 bottles, walnut', unitCostMinor: 96_000 },
  },
] as const;

/**
 * A quote of the past, made as the estimator makes one (from the job's plan, if it has one) and then answered as its
 * customer did; an accepted one has its deposit paid the next day.
 */
async function pastQuote(
  db: Db,
  q: {
    shopId: string;
    userId: string;
    jobId: string;
    planId: string | null;
    sentAt: Date;
    answer: { status: 'accepted'; at: Date; by: string } | { status: 'declined'; at: Date; reason: string } | { status: 'expired' };
    line?: { description: string; unitCostMinor: number };
  },
) {
  const made = await createQuote({ db, shopId: q.shopId, userId: q.userId }, q.jobId, q.planId);
  const lines = q.line
    ? [
        {
          id: 'o-1',
          kind: 'other' as const,
          description: q.line.description,
          quantity: 1,
          unit: 'each',
          unitCostMinor: q.line.unitCostMinor,
          taxable: true,
          note: '',
        },
      ]
    : made.lines;
  const validUntil = new Date(q.sentAt.getTime() + made.validityDays * 86_400_000).toISOString().slice(0, 10);
  const answeredAt = q.answer.status === 'expired' ? null : q.answer.at;
  const [revision] = await db
    .update(quoteRevisions)
    .set({
      lines,
      status: q.answer.status,
      sentAt: q.sentAt,
      validUntil,
      answeredAt,
      acceptedName: q.answer.status === 'accepted' ? q.answer.by : null,
      declineReason: q.answer.status === 'declined' ? q.answer.reason : null,
      createdAt: q.sentAt,
      updatedAt: answeredAt ?? q.sentAt,
    })
    .where(eq(quoteRevisions.id, made.id))
    .returning();
  await db.update(quotes).set({ createdAt: q.sentAt }).where(eq(quotes.id, revision.quoteId));
  if (q.answer.status !== 'accepted') return;
  const deposit = revisionTotals(revision).depositMinor;
  const paidAt = new Date(q.answer.at.getTime() + 86_400_000);
  await db.insert(quotePayments).values({
    shopId: q.shopId,
    revisionId: revision.id,
    jobId: q.jobId,
    checkoutSessionId: `cs_demo_${revision.id}`,
    paymentIntentId: `pi_demo_${revision.id}`,
    amountMinor: deposit,
    currency: revision.currency,
    status: 'paid',
    createdAt: paidAt,
    paidAt,
  });
}

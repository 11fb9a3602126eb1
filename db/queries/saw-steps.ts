import type { Scope, ShopScope } from '../scope';
import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { customers, jobs, plans, sawSteps, users } from '../schema';
import { readPlan } from '@/lib/nesting';
import { recordAudit } from './audit';
import { syncJobStatus } from './job-status';
import { getPlan } from './plan-document';
import { getShopSettings } from './shops';
import { invalid, notFound, conflict } from '@/lib/errors';
import type { PlanTicks, StepRef, StepTick } from '@/shared/wire/plans';

/** Plans the saw works on; ticks are refused on drafts, finished and cancelled plans. */
const CUTTABLE = ['released', 'cutting'] as const;

export async function listStepTicks({ db, shopId }: ShopScope, planId: string): Promise<StepTick[]> {
  const rows = await db
    .select({ piece: sawSteps.pieceIndex, step: sawSteps.seq, doneAt: sawSteps.doneAt, doneBy: users.name })
    .from(sawSteps)
    .leftJoin(users, eq(users.id, sawSteps.doneBy))
    .where(and(eq(sawSteps.shopId, shopId), eq(sawSteps.planId, planId)))
    .orderBy(asc(sawSteps.pieceIndex), asc(sawSteps.seq));
  return rows.map((r) => ({ ...r, doneAt: r.doneAt.toISOString() }));
}

/** The plan's status, refusing a plan of another shop (404) or one not at the saw (409), and a step it lacks (422). */
async function checkStep(db: Db, shopId: string, planId: string, ref: StepRef) {
  const [row] = await db
    .select({ status: plans.status, document: plans.document })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.id, planId)));
  if (!row) throw notFound('That plan');
  if (!(CUTTABLE as readonly string[]).includes(row.status)) {
    throw conflict(`This plan is ${row.status}: steps are ticked only on a released plan or one being cut.`);
  }
  const piece = readPlan(row.document).pieces[ref.piece];
  if (!piece) throw invalid(`The plan has no stock piece ${ref.piece + 1}.`, { piece: ['No such stock piece in this plan.'] });
  if (!(piece.sawOrder ?? []).some((s) => s.n === ref.step)) {
    throw invalid(`That stock piece has no step ${ref.step}.`, { step: ['No such step on this stock piece.'] });
  }
}

/**
 * Ticks a step done. Idempotent and safe for several cutters at once: insert-or-ignore on the step's unique key,
 * so a second tick keeps the first one's who and when. The first tick on a released plan moves it to `cutting`.
 */
export async function tickStep({ db, shopId, userId }: Scope, planId: string, ref: StepRef): Promise<PlanTicks> {
  await checkStep(db, shopId, planId, ref);
  await db.transaction(async (tx) => {
    const inserted = await tx
      .insert(sawSteps)
      .values({ shopId, planId, pieceIndex: ref.piece, seq: ref.step, doneBy: userId })
      .onConflictDoNothing({ target: [sawSteps.planId, sawSteps.pieceIndex, sawSteps.seq] })
      .returning({ id: sawSteps.id });
    const started = await tx
      .update(plans)
      .set({ status: 'cutting', updatedAt: sql`now()` })
      .where(and(eq(plans.shopId, shopId), eq(plans.id, planId), eq(plans.status, 'released')))
      .returning({ jobId: plans.jobId, name: plans.name });
    // The first tick starts the saw on this plan: the job is being cut, whatever it said before.
    if (started.length) await syncJobStatus({ db: tx, shopId, userId }, started[0].jobId, `first step of plan “${started[0].name}” ticked`);
    if (inserted.length) await recordAudit(tx, { shopId, userId, action: 'tick', entity: 'saw-step', entityId: planId, data: ref });
  });
  return getStepTicks({ db, shopId }, planId);
}

/** Takes a tick back (a step ticked by mistake). Untouched when it was not ticked; the plan stays `cutting`. */
export async function untickStep({ db, shopId, userId }: Scope, planId: string, ref: StepRef): Promise<PlanTicks> {
  await checkStep(db, shopId, planId, ref);
  await db.transaction(async (tx) => {
    const removed = await tx
      .delete(sawSteps)
      .where(and(eq(sawSteps.shopId, shopId), eq(sawSteps.planId, planId), eq(sawSteps.pieceIndex, ref.piece), eq(sawSteps.seq, ref.step)))
      .returning({ id: sawSteps.id });
    if (removed.length) await recordAudit(tx, { shopId, userId, action: 'untick', entity: 'saw-step', entityId: planId, data: ref });
  });
  return getStepTicks({ db, shopId }, planId);
}

/** Ticked steps per plan, for the shop-floor queue. */
export async function countStepTicks({ db, shopId }: ShopScope, planIds: string[]): Promise<Map<string, number>> {
  if (planIds.length === 0) return new Map();
  const rows = await db
    .select({ planId: sawSteps.planId, n: sql<number>`count(*)::int` })
    .from(sawSteps)
    .where(and(eq(sawSteps.shopId, shopId), inArray(sawSteps.planId, planIds)))
    .groupBy(sawSteps.planId);
  return new Map(rows.map((r) => [r.planId, Number(r.n)]));
}

/** A plan's status and ticks together (not found when the shop has no such plan). */
export async function getStepTicks({ db, shopId }: ShopScope, planId: string): Promise<PlanTicks> {
  const [row] = await db
    .select({ status: plans.status })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.id, planId)));
  if (!row) throw notFound('That plan');
  return { status: row.status, ticks: await listStepTicks({ db, shopId }, planId) };
}

/**
 * Everything the saw-order pages, part tags, shop floor and PDF show for one plan: the document, its job, the kerf it
 * was nested with, its parts' grain rules, and the shop's units. Not found when the shop has no such plan, or when
 * it is a draft and drafts are not to be shown (people who cannot edit plans see only released work).
 */
export async function getSawOrder({ db, shopId }: ShopScope, planId: string, { drafts }: { drafts: boolean }) {
  const [plan, settings] = await Promise.all([getPlan({ db, shopId }, planId), getShopSettings({ db, shopId })]);
  if (plan.status === 'draft' && !drafts) throw notFound('That plan');
  const [job] = await db
    .select({ id: jobs.id, name: jobs.name, customer: sql<string>`coalesce(${customers.name}, '')` })
    .from(jobs)
    .leftJoin(customers, eq(customers.id, jobs.customerId))
    .where(and(eq(jobs.shopId, shopId), eq(jobs.id, plan.jobId)));
  const kerf = plan.request?.settings.kerf ?? settings.kerf;
  return {
    id: plan.id,
    name: plan.name,
    status: plan.status,
    document: plan.document,
    job: job ?? { id: plan.jobId, name: 'Job', customer: '' },
    kerf,
    parts: plan.request?.parts ?? [],
    units: settings.units,
  };
}
export type SawOrderData = NonNullable<Awaited<ReturnType<typeof getSawOrder>>>;

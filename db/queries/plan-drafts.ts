import type { Scope, ShopScope } from '../scope';
import { and, desc, eq } from 'drizzle-orm';
import { plans } from '../schema';
import type { NestRequest, Plan } from '@/shared/schemas/nesting';
import { recordAudit } from './audit';
import { conflict, notFound } from '@/lib/errors';
import type { JobPlanSummary } from '@/shared/wire/plans';

/** What a list of a job's plans shows. */
export type { JobPlanSummary } from '@/shared/wire/plans';

// Millisecond times set here (not the database's microsecond now()) so `baseUpdatedAt` round-trips through JSON exactly.
const stamp = () => {
  const now = new Date();
  return { createdAt: now, updatedAt: now };
};

/** The columns kept beside a document: its version (so a read knows without opening it), yield and cost. */
const figures = (plan: Plan) => ({
  version: plan.version,
  yieldRatio: plan.totals?.yield ?? null,
  costCents: plan.totals ? Math.round(plan.totals.cost) : null,
});

export async function listJobPlans({ db, shopId }: ShopScope, jobId: string): Promise<JobPlanSummary[]> {
  const rows = await db
    .select()
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.jobId, jobId)))
    .orderBy(desc(plans.createdAt));
  return rows.map((r) => {
    const doc = r.document as Partial<Plan>;
    return {
      id: r.id,
      name: r.name,
      status: r.status,
      recutPlan: r.recutPlan,
      yieldRatio: r.yieldRatio,
      costCents: r.costCents,
      pieces: doc.pieces?.length ?? 0,
      unplaced: doc.unplaced?.length ?? 0,
      createdAt: r.createdAt.toISOString(),
      updatedAt: r.updatedAt.toISOString(),
    };
  });
}

/** A new draft plan with the request it was nested from (already judged valid by the caller). */
export async function createDraftPlan(
  { db, shopId, userId }: Scope,
  jobId: string,
  input: { name: string; request: NestRequest; plan: Plan; recutPlan?: boolean },
) {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(plans)
      .values({
        shopId: shopId,
        jobId: jobId,
        name: input.name,
        status: 'draft',
        recutPlan: input.recutPlan ?? false,
        request: input.request,
        document: input.plan,
        ...figures(input.plan),
        createdBy: userId,
        ...stamp(),
      })
      .returning({ id: plans.id, updatedAt: plans.updatedAt });
    await recordAudit(tx, {
      shopId: shopId,
      userId: userId,
      action: 'create',
      entity: 'plan',
      entityId: row.id,
      data: { jobId: jobId, name: input.name, recutPlan: input.recutPlan ?? false },
    });
    return row;
  });
}

/**
 * Stores an edited document on a draft plan (already judged valid by the caller) and answers when. Refused (409)
 * when the plan is no longer a draft, or when `baseUpdatedAt` is given and someone saved since.
 */
export async function updateDraftPlan(
  { db, shopId, userId }: Scope,
  planId: string,
  input: { plan: Plan; name?: string; baseUpdatedAt?: string },
): Promise<{ updatedAt: Date }> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select({ status: plans.status, updatedAt: plans.updatedAt })
      .from(plans)
      .where(and(eq(plans.shopId, shopId), eq(plans.id, planId)));
    if (!row) throw notFound('That plan');
    if (row.status !== 'draft') throw conflict('Only a draft plan can be edited.');
    if (input.baseUpdatedAt && new Date(input.baseUpdatedAt).getTime() !== row.updatedAt.getTime())
      throw conflict('Someone saved this plan after you opened it; reload to see their changes.');
    const updatedAt = new Date();
    await tx
      .update(plans)
      .set({ document: input.plan, ...figures(input.plan), ...(input.name ? { name: input.name } : {}), updatedAt })
      .where(and(eq(plans.shopId, shopId), eq(plans.id, planId), eq(plans.status, 'draft')));
    await recordAudit(tx, {
      shopId,
      userId,
      action: 'update',
      entity: 'plan',
      entityId: planId,
      data: { edited: true },
    });
    return { updatedAt };
  });
}

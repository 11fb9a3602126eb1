import type { Scope, ShopScope } from '../scope';
import { aliasedTable, and, asc, eq, inArray, sql } from 'drizzle-orm';
import { parts, plans, recuts, users } from '../schema';
import { DEFAULT_RECUT_REASON, recutLabel, type RecutPart } from '@/lib/recuts/recuts';
import type { NestRequest } from '@/shared/schemas/nesting';
import type { RecutView } from '@/shared/schemas/recut';
import { recordAudit } from './audit';
import { syncJobStatus } from './job-status';
import { invalid, notFound, conflict } from '@/lib/errors';

const sourcePlans = aliasedTable(plans, 'source_plans');
const recutPlans = aliasedTable(plans, 'recut_plans');
const closers = aliasedTable(users, 'closers');

/** A re-cut's size and material, as the damaged part had them. */
export const recutSize = (r: typeof recuts.$inferSelect) => ({
  quantity: r.quantity,
  length: r.length,
  width: r.width,
  thickness: r.thickness,
  material: r.material,
  grain: r.grain,
});

/** The job's re-cut list: open ones first (oldest first, the order they were damaged), then the closed ones, newest first. */
export async function listRecuts({ db, shopId }: ShopScope, jobId: string): Promise<RecutView[]> {
  const rows = await db
    .select({
      r: recuts,
      sourceName: sourcePlans.name,
      recutName: recutPlans.name,
      createdBy: users.name,
      closedBy: closers.name,
    })
    .from(recuts)
    .leftJoin(sourcePlans, eq(sourcePlans.id, recuts.sourcePlanId))
    .leftJoin(recutPlans, eq(recutPlans.id, recuts.recutPlanId))
    .leftJoin(users, eq(users.id, recuts.createdBy))
    .leftJoin(closers, eq(closers.id, recuts.closedBy))
    .where(and(eq(recuts.shopId, shopId), eq(recuts.jobId, jobId)))
    .orderBy(
      sql`case when ${recuts.status} in ('open', 'planned') then 0 else 1 end`,
      asc(recuts.createdAt),
      asc(recuts.label),
      asc(recuts.instance),
    );
  const open = rows.filter((x) => x.r.status === 'open' || x.r.status === 'planned');
  const closed = rows.filter((x) => !open.includes(x)).sort((a, b) => (b.r.closedAt?.getTime() ?? 0) - (a.r.closedAt?.getTime() ?? 0));
  return [...open, ...closed].map(({ r, sourceName, recutName, createdBy, closedBy }) => ({
    id: r.id,
    label: r.label,
    instance: r.instance,
    ...recutSize(r),
    reason: r.reason,
    status: r.status,
    sourcePlan: r.sourcePlanId && sourceName ? { id: r.sourcePlanId, name: sourceName } : null,
    recutPlan: r.recutPlanId && recutName ? { id: r.recutPlanId, name: recutName } : null,
    createdAt: r.createdAt.toISOString(),
    createdBy,
    closedAt: r.closedAt?.toISOString() ?? null,
    closedBy,
    cancelReason: r.cancelReason,
  }));
}

/** The job's re-cuts still to nest (open, not in a released plan), oldest first. */
export async function openRecuts({ db, shopId }: ShopScope, jobId: string): Promise<RecutPart[]> {
  return db
    .select({
      id: recuts.id,
      label: recuts.label,
      instance: recuts.instance,
      quantity: recuts.quantity,
      length: recuts.length,
      width: recuts.width,
      thickness: recuts.thickness,
      material: recuts.material,
      grain: recuts.grain,
      jointAllowance: recuts.jointAllowance,
      reason: recuts.reason,
    })
    .from(recuts)
    .where(and(eq(recuts.shopId, shopId), eq(recuts.jobId, jobId), eq(recuts.status, 'open')))
    .orderBy(asc(recuts.createdAt), asc(recuts.label), asc(recuts.instance));
}

export interface DamagedPiece {
  partId: string;
  instance: number;
  reason: string;
}

type PlanRow = typeof plans.$inferSelect;

/**
 * At done: every damaged piece goes on the job's re-cut list. On a cut-list plan the piece is a part of the request
 * (its size copied from there); on a re-cut plan it is one of the re-cuts the plan held, which is marked spoiled
 * and replaced by a new open one. Returns the new re-cuts' ids.
 */
export async function recordDamagedPieces(
  { db: tx, shopId, userId }: Scope,
  { plan, request, damaged }: { plan: PlanRow; request: NestRequest | null; damaged: DamagedPiece[] },
): Promise<string[]> {
  if (!damaged.length) return [];
  const heldRecuts = plan.recutPlan
    ? await tx
        .select()
        .from(recuts)
        .where(and(eq(recuts.shopId, shopId), eq(recuts.recutPlanId, plan.id), inArray(recuts.id, damaged.map((d) => d.partId).filter(isUuid))))
    : [];
  const partIds = damaged.map((d) => d.partId).filter(isUuid);
  const jobParts =
    !plan.recutPlan && partIds.length
      ? new Set(
          (
            await tx
              .select({ id: parts.id })
              .from(parts)
              .where(and(eq(parts.shopId, shopId), eq(parts.jobId, plan.jobId), inArray(parts.id, partIds)))
          ).map((p) => p.id),
        )
      : new Set<string>();

  const { rows, spoiled } = recutRows({ shopId, userId, plan, request, damaged }, heldRecuts, jobParts);
  if (spoiled.length) {
    await tx
      .update(recuts)
      .set({ status: 'spoiled', closedAt: new Date(), closedBy: userId })
      .where(and(eq(recuts.shopId, shopId), inArray(recuts.id, spoiled)));
  }
  const created = await tx.insert(recuts).values(rows).returning({ id: recuts.id, label: recuts.label, instance: recuts.instance });
  await recordAudit(tx, {
    shopId,
    userId,
    action: 'damaged',
    entity: 'plan',
    entityId: plan.id,
    data: { recuts: created.map((r) => recutLabel(r)) },
  });
  return created.map((r) => r.id);
}

/**
 * One re-cut row per damaged piece, sized as the part was: a piece of a re-cut plan repeats its re-cut (which is
 * then spoiled); any other is read from the plan's request, linked to its cut-list row while that row exists.
 */
function recutRows(
  { shopId, userId, plan, request, damaged }: { shopId: string; userId: string; plan: PlanRow; request: NestRequest | null; damaged: DamagedPiece[] },
  heldRecuts: (typeof recuts.$inferSelect)[],
  jobParts: Set<string>,
) {
  const rows: (typeof recuts.$inferInsert)[] = [];
  const spoiled: string[] = [];
  for (const d of damaged) {
    const reason = d.reason.trim() || DEFAULT_RECUT_REASON;
    const base = { shopId, jobId: plan.jobId, reason, status: 'open' as const, sourcePlanId: plan.id, createdBy: userId };
    const held = heldRecuts.find((r) => r.id === d.partId);
    if (held) {
      spoiled.push(held.id);
      const { partId, label, instance, quantity, length, width, thickness, material, grain, jointAllowance } = held;
      rows.push({ ...base, partId, label, instance, quantity, length, width, thickness, material, grain, jointAllowance });
      continue;
    }
    const part = request?.parts.find((p) => p.id === d.partId);
    if (!part) throw invalid(`The plan has no part ${d.partId}: nothing was recorded.`);
    rows.push({
      ...base,
      partId: jobParts.has(part.id) ? part.id : null,
      label: part.label || part.id,
      instance: d.instance,
      quantity: 1,
      length: part.length,
      width: part.width,
      thickness: part.thickness,
      material: part.material,
      grain: part.grain,
      jointAllowance: part.jointAllowance,
    });
  }
  return { rows, spoiled };
}

/**
 * At release of a re-cut plan: the re-cuts it places become planned (held by this plan), all or none. A re-cut
 * cancelled, or taken by another plan, since the Nest refuses the release with its name.
 */
export async function holdRecutsForPlan({ db: tx, shopId }: ShopScope, planId: string, recutIds: string[]) {
  const ids = [...new Set(recutIds)].filter(isUuid).sort();
  if (!ids.length) return;
  const held = await tx
    .update(recuts)
    .set({ status: 'planned', recutPlanId: planId })
    .where(and(eq(recuts.shopId, shopId), inArray(recuts.id, ids), eq(recuts.status, 'open')))
    .returning({ id: recuts.id });
  if (held.length === ids.length) return;
  const gone = await tx
    .select({ label: recuts.label, instance: recuts.instance, status: recuts.status })
    .from(recuts)
    .where(
      and(
        eq(recuts.shopId, shopId),
        inArray(
          recuts.id,
          ids.filter((id) => !held.some((h) => h.id === id)),
        ),
      ),
    );
  const names = gone.map((g) => `${recutLabel(g)} (${g.status === 'planned' ? 'in another released plan' : g.status})`);
  throw conflict(
    `${names.length ? names.join(', ') : 'A re-cut of this plan'} ${names.length === 1 ? 'is' : 'are'} no longer open. Nothing was released; nest the re-cuts again.`,
  );
}

/** At cancel of a re-cut plan: what it held goes back on the list to nest again. */
export async function reopenRecuts({ db: tx, shopId }: ShopScope, planId: string) {
  await tx
    .update(recuts)
    .set({ status: 'open', recutPlanId: null })
    .where(and(eq(recuts.shopId, shopId), eq(recuts.recutPlanId, planId), eq(recuts.status, 'planned')));
}

/** At done of a re-cut plan: what it held (and was not damaged again) is cut. */
export async function closeRecuts({ db: tx, shopId, userId }: Scope, planId: string) {
  return tx
    .update(recuts)
    .set({ status: 'cut', closedAt: new Date(), closedBy: userId })
    .where(and(eq(recuts.shopId, shopId), eq(recuts.recutPlanId, planId), eq(recuts.status, 'planned')))
    .returning({ id: recuts.id });
}

/** The estimator or owner takes a re-cut off the list, with the reason; one in a released plan is refused. */
export async function cancelRecut({ db, shopId, userId }: Scope, id: string, reason: string) {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .update(recuts)
      .set({ status: 'cancelled', cancelReason: reason, closedAt: new Date(), closedBy: userId })
      .where(and(eq(recuts.shopId, shopId), eq(recuts.id, id), eq(recuts.status, 'open')))
      .returning();
    if (!row) {
      const [existing] = await tx
        .select({ status: recuts.status, planName: plans.name })
        .from(recuts)
        .leftJoin(plans, eq(plans.id, recuts.recutPlanId))
        .where(and(eq(recuts.shopId, shopId), eq(recuts.id, id)));
      if (!existing) throw notFound('That re-cut');
      if (existing.status === 'planned')
        throw conflict(`This re-cut is in the released plan “${existing.planName ?? ''}”: cancel that plan first, or finish it.`);
      throw conflict(`This re-cut is already ${existing.status}.`);
    }
    await recordAudit(tx, { shopId, userId, action: 'cancel', entity: 'recut', entityId: id, data: { label: recutLabel(row), reason } });
    const jobStatus = await syncJobStatus({ db: tx, shopId, userId }, row.jobId, 're-cut cancelled');
    return { id: row.id, status: row.status, jobStatus };
  });
}

const isUuid = (s: string) => /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i.test(s);

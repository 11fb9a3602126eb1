import type { Scope, ShopScope } from '../scope';
import { and, asc, eq, max } from 'drizzle-orm';
import type { Db } from '../open';
import { drawerSchedules, jobs, parts } from '../schema';
import { PART_FIELD_NAMES, SCHEDULE_OWNED_FIELDS, type Part, type PartInput, type PartPatch } from '@/shared/schemas/part';
import { recordAudit } from './audit';
import { conflict, notFound } from '@/lib/errors';

type PartRow = typeof parts.$inferSelect;

export async function listParts({ db, shopId }: ShopScope, jobId: string) {
  return db
    .select()
    .from(parts)
    .where(and(eq(parts.shopId, shopId), eq(parts.jobId, jobId)))
    .orderBy(asc(parts.sort), asc(parts.createdAt));
}

export const toPart = (row: PartRow): Part => ({
  id: row.id,
  jobId: row.jobId,
  label: row.label,
  quantity: row.quantity,
  length: row.length,
  width: row.width,
  thickness: row.thickness,
  material: row.material,
  grain: row.grain,
  jointAllowance: row.jointAllowance,
  notes: row.notes,
  drawerScheduleId: row.drawerScheduleId,
  role: row.role,
  machining: row.machining ?? [],
  sort: row.sort,
});

/** The job's cut list as the API shows it, with the label of the drawer schedule each derived row comes from. */
export async function listJobParts({ db, shopId }: ShopScope, jobId: string): Promise<(Part & { schedule: string | null })[]> {
  const rows = await db
    .select({ part: parts, schedule: drawerSchedules.label })
    .from(parts)
    .leftJoin(drawerSchedules, eq(drawerSchedules.id, parts.drawerScheduleId))
    .where(and(eq(parts.shopId, shopId), eq(parts.jobId, jobId)))
    .orderBy(asc(parts.sort), asc(parts.createdAt));
  return rows.map((r) => ({ ...toPart(r.part), schedule: r.schedule }));
}

/** Refuses (not found) a job that is not this shop's: another shop's job does not exist, from here. */
export async function requireJob({ db, shopId }: ShopScope, jobId: string): Promise<void> {
  const [row] = await db
    .select({ id: jobs.id })
    .from(jobs)
    .where(and(eq(jobs.shopId, shopId), eq(jobs.id, jobId)));
  if (!row) throw notFound('That job');
}

/** The next free sort position at the end of a job's cut list. */
export async function nextSort({ db, shopId }: ShopScope, jobId: string): Promise<number> {
  const [row] = await db
    .select({ last: max(parts.sort) })
    .from(parts)
    .where(and(eq(parts.shopId, shopId), eq(parts.jobId, jobId)));
  return (row?.last ?? -1) + 1;
}

/** Marks the job as changed, so the jobs list shows what was worked on last. */
export async function touchJob({ db, shopId }: ShopScope, jobId: string) {
  await db
    .update(jobs)
    .set({ updatedAt: new Date() })
    .where(and(eq(jobs.shopId, shopId), eq(jobs.id, jobId)));
}

/** Adds typed or uploaded rows at the end of the cut list (or at a given place: undo), all or none. */
export async function addParts(
  { db, shopId, userId }: Scope,
  jobId: string,
  inputs: readonly PartInput[],
  source: 'typed' | 'upload',
): Promise<Part[]> {
  return db.transaction(async (tx) => {
    await requireJob({ db: tx, shopId }, jobId);
    if (inputs.length === 0) return [];
    const start = await nextSort({ db: tx, shopId }, jobId);
    const rows = await tx
      .insert(parts)
      .values(inputs.map((p, i) => ({ ...p, shopId, jobId, sort: p.sort ?? start + i })))
      .returning();
    await touchJob({ db: tx, shopId }, jobId);
    await recordAudit(tx, {
      shopId,
      userId,
      action: source === 'upload' ? 'import' : 'create',
      entity: 'part',
      entityId: rows.length === 1 ? rows[0].id : undefined,
      data: { jobId, count: rows.length },
    });
    return rows.map(toPart);
  });
}

async function findPart(db: Db, shopId: string, jobId: string, partId: string) {
  const [row] = await db
    .select()
    .from(parts)
    .where(and(eq(parts.shopId, shopId), eq(parts.jobId, jobId), eq(parts.id, partId)));
  return row;
}

/**
 * Changes one row. A drawer schedule's row keeps its sizes, material and count in step with the schedule: only its
 * notes may change here (409 otherwise, naming the fields).
 */
export async function updatePart({ db, shopId, userId }: Scope, jobId: string, partId: string, patch: PartPatch): Promise<Part> {
  return db.transaction(async (tx) => {
    const row = await findPart(tx, shopId, jobId, partId);
    if (!row) throw notFound('That part');
    if (row.drawerScheduleId) {
      const owned = SCHEDULE_OWNED_FIELDS.filter((f) => patch[f] !== undefined && patch[f] !== row[f]);
      if (owned.length)
        throw conflict(
          `This row comes from a drawer schedule: change its ${owned.map((f) => PART_FIELD_NAMES[f]).join(', ')} in the schedule instead.`,
        );
    }
    const [updated] = await tx.update(parts).set(patch).where(eq(parts.id, partId)).returning();
    await touchJob({ db: tx, shopId }, jobId);
    await recordAudit(tx, { shopId, userId, action: 'update', entity: 'part', entityId: partId, data: patch });
    return toPart(updated);
  });
}

/** Deletes one typed or uploaded row; a drawer schedule's rows go with their schedule (409). */
export async function deletePart({ db, shopId, userId }: Scope, jobId: string, partId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const row = await findPart(tx, shopId, jobId, partId);
    if (!row) throw notFound('That part');
    if (row.drawerScheduleId) throw conflict('This row comes from a drawer schedule: delete or change the schedule instead.');
    await tx.delete(parts).where(eq(parts.id, partId));
    await touchJob({ db: tx, shopId }, jobId);
    await recordAudit(tx, { shopId, userId, action: 'delete', entity: 'part', entityId: partId, data: { label: row.label, jobId } });
  });
}

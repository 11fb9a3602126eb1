import type { SavedDrawerSchedule } from '@/shared/wire/jobs';
import type { Scope, ShopScope } from '../scope';
import { notFound } from '@/lib/errors';
import { and, asc, count, eq, isNotNull, min, sql } from 'drizzle-orm';
import { drawerSchedules, parts } from '../schema';
import type { DrawerPart } from '@/lib/joinery/types';
import type { DrawerSchedule } from '@/shared/schemas/drawer-schedule';
import { recordAudit } from './audit';
import { nextSort, requireJob, touchJob } from './parts';

export type { SavedDrawerSchedule } from '@/shared/wire/jobs';

export const DRAWER_ROLE_NAMES: Record<DrawerPart['role'], string> = {
  front: 'front',
  back: 'back',
  side: 'side',
  bottom: 'bottom',
  'applied-front': 'applied front',
};

/** A schedule's part as its cut-list row: "Kitchen drawers · side". */
export const drawerPartRow = (p: DrawerPart) => ({
  label: `${p.schedule} · ${DRAWER_ROLE_NAMES[p.role]}`,
  quantity: p.quantity,
  length: p.length,
  width: p.width,
  thickness: p.thickness,
  material: p.material,
  grain: p.grain,
  jointAllowance: p.jointAllowance,
  role: p.role,
  machining: p.machining,
});

export async function listDrawerSchedules({ db, shopId }: ShopScope, jobId: string): Promise<SavedDrawerSchedule[]> {
  const rows = await db
    .select({
      id: drawerSchedules.id,
      jobId: drawerSchedules.jobId,
      label: drawerSchedules.label,
      input: drawerSchedules.input,
      updatedAt: drawerSchedules.updatedAt,
    })
    .from(drawerSchedules)
    .where(and(eq(drawerSchedules.shopId, shopId), eq(drawerSchedules.jobId, jobId)))
    .orderBy(asc(drawerSchedules.createdAt));
  const counts = await db
    .select({ id: parts.drawerScheduleId, n: count() })
    .from(parts)
    .where(and(eq(parts.shopId, shopId), eq(parts.jobId, jobId), isNotNull(parts.drawerScheduleId)))
    .groupBy(parts.drawerScheduleId);
  const rowsOf = new Map(counts.map((c) => [c.id, Number(c.n)]));
  return rows.map((r) => ({ ...r, input: r.input as DrawerSchedule, partRows: rowsOf.get(r.id) ?? 0, updatedAt: r.updatedAt.toISOString() }));
}

/**
 * Saves a sized schedule and replaces its cut-list rows in one transaction: the rows of a changed schedule are
 * replaced where they stood in the list, never added twice. Not found when the job (or the schedule) is not this shop's.
 */
export async function saveDrawerSchedule(
  { db, shopId, userId }: Scope,
  jobId: string,
  scheduleId: string | null,
  input: DrawerSchedule,
  sized: readonly DrawerPart[],
): Promise<SavedDrawerSchedule> {
  const id = await db.transaction(async (tx) => {
    await requireJob({ db: tx, shopId }, jobId);
    let id = scheduleId;
    let sort: number;
    if (id) {
      const updated = await tx
        .update(drawerSchedules)
        .set({ label: input.label, input, updatedAt: new Date() })
        .where(and(eq(drawerSchedules.shopId, shopId), eq(drawerSchedules.jobId, jobId), eq(drawerSchedules.id, id)))
        .returning({ id: drawerSchedules.id });
      if (!updated.length) throw notFound('That drawer schedule');
      const [first] = await tx
        .select({ sort: min(parts.sort) })
        .from(parts)
        .where(eq(parts.drawerScheduleId, id));
      sort = first?.sort ?? (await nextSort({ db: tx, shopId }, jobId));
      await tx.delete(parts).where(and(eq(parts.shopId, shopId), eq(parts.drawerScheduleId, id)));
    } else {
      const [row] = await tx.insert(drawerSchedules).values({ shopId, jobId, label: input.label, input }).returning({ id: drawerSchedules.id });
      id = row.id;
      sort = await nextSort({ db: tx, shopId }, jobId);
    }
    // Rows after the schedule's place make room when it now has more parts than before.
    if (scheduleId)
      await tx
        .update(parts)
        .set({ sort: sql`${parts.sort} + ${sized.length}` })
        .where(and(eq(parts.shopId, shopId), eq(parts.jobId, jobId), sql`${parts.sort} >= ${sort}`));
    await tx.insert(parts).values(sized.map((p, i) => ({ ...drawerPartRow(p), shopId, jobId, drawerScheduleId: id, sort: sort + i })));
    await touchJob({ db: tx, shopId }, jobId);
    await recordAudit(tx, {
      shopId,
      userId,
      action: scheduleId ? 'update' : 'create',
      entity: 'drawer-schedule',
      entityId: id,
      data: { label: input.label, parts: sized.length },
    });
    return id;
  });
  const saved = (await listDrawerSchedules({ db, shopId }, jobId)).find((s) => s.id === id);
  if (!saved) throw notFound('That drawer schedule');
  return saved;
}

/** Deletes a schedule and every cut-list row it made. */
export async function deleteDrawerSchedule({ db, shopId, userId }: Scope, jobId: string, scheduleId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const where = and(eq(drawerSchedules.shopId, shopId), eq(drawerSchedules.jobId, jobId), eq(drawerSchedules.id, scheduleId));
    const [row] = await tx.select({ label: drawerSchedules.label }).from(drawerSchedules).where(where);
    if (!row) throw notFound('That drawer schedule');
    await tx.delete(parts).where(and(eq(parts.shopId, shopId), eq(parts.drawerScheduleId, scheduleId)));
    await tx.delete(drawerSchedules).where(where);
    await touchJob({ db: tx, shopId }, jobId);
    await recordAudit(tx, { shopId, userId, action: 'delete', entity: 'drawer-schedule', entityId: scheduleId, data: row });
  });
}

import type { SavedSaw } from '@/shared/wire/settings';
import type { Scope, ShopScope, SystemScope } from '../scope';
import { and, asc, eq, ne, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { saws } from '../schema';
import type { Saw, SawKind } from '@/shared/schemas/saw';
import { recordAudit } from './audit';
import { conflict, notFound } from '@/lib/errors';

export type { SavedSaw } from '@/shared/wire/settings';

type Row = typeof saws.$inferSelect;

const toSaw = (r: Row): SavedSaw => ({
  id: r.id,
  kind: r.kind as SawKind,
  kindName: r.kindName,
  name: r.name,
  kerf: r.kerf,
  ripCapacity: r.ripCapacity,
  crosscutCapacity: r.crosscutCapacity,
  maxPieceLength: r.maxPieceLength,
  maxPieceWidth: r.maxPieceWidth,
  maxStages: r.maxStages as Saw['maxStages'],
  firstStage: r.firstStage as Saw['firstStage'],
  minFenceWidth: r.minFenceWidth,
  updatedAt: r.updatedAt.toISOString(),
});

/** The shop's saws in the order they were added: the first is the nest's default. */
export async function listSaws({ db, shopId }: ShopScope): Promise<SavedSaw[]> {
  const rows = await db.select().from(saws).where(eq(saws.shopId, shopId)).orderBy(asc(saws.position), asc(saws.createdAt), asc(saws.id));
  return rows.map(toSaw);
}

/** One saw per name in a shop, whatever the case (409). */
async function refuseDuplicate(db: Db, shopId: string, name: string, exceptId?: string) {
  const same = await db
    .select({ id: saws.id })
    .from(saws)
    .where(and(eq(saws.shopId, shopId), sql`lower(${saws.name}) = lower(${name})`, exceptId ? ne(saws.id, exceptId) : undefined));
  if (same.length) throw conflict(`The shop already has a saw named “${name}”: edit that one, or give this one another name.`);
}

const columns = (s: Saw) => ({
  kind: s.kind,
  kindName: s.kind === 'other' ? s.kindName : null,
  name: s.name,
  kerf: s.kerf,
  ripCapacity: s.ripCapacity,
  crosscutCapacity: s.crosscutCapacity,
  maxPieceLength: s.maxPieceLength,
  maxPieceWidth: s.maxPieceWidth,
  maxStages: s.maxStages,
  firstStage: s.firstStage,
  minFenceWidth: s.minFenceWidth,
});

export async function createSaw({ db, shopId, userId }: SystemScope, saw: Saw): Promise<SavedSaw> {
  return db.transaction(async (tx) => {
    await refuseDuplicate(tx, shopId, saw.name);
    const [{ next }] = await tx
      .select({ next: sql<number>`coalesce(max(${saws.position}) + 1, 0)::int` })
      .from(saws)
      .where(eq(saws.shopId, shopId));
    const [row] = await tx
      .insert(saws)
      .values({ shopId, ...columns(saw), position: next })
      .returning();
    await recordAudit(tx, { shopId, userId, action: 'create', entity: 'saw', entityId: row.id, data: saw });
    return toSaw(row);
  });
}

/** Null when the saw is not this shop's. Saved plans keep the profile they were nested with. */
export async function updateSaw({ db, shopId, userId }: Scope, id: string, saw: Saw): Promise<SavedSaw> {
  return db.transaction(async (tx) => {
    await refuseDuplicate(tx, shopId, saw.name, id);
    const [row] = await tx
      .update(saws)
      .set({ ...columns(saw), updatedAt: new Date() })
      .where(and(eq(saws.shopId, shopId), eq(saws.id, id)))
      .returning();
    if (!row) throw notFound('That saw');
    await recordAudit(tx, { shopId, userId, action: 'update', entity: 'saw', entityId: id, data: saw });
    return toSaw(row);
  });
}

export async function deleteSaw({ db, shopId, userId }: Scope, id: string): Promise<void> {
  await db.transaction(async (tx) => {
    const rows = await tx
      .delete(saws)
      .where(and(eq(saws.shopId, shopId), eq(saws.id, id)))
      .returning({ name: saws.name });
    if (!rows.length) throw notFound('That saw');
    await recordAudit(tx, { shopId, userId, action: 'delete', entity: 'saw', entityId: id, data: rows[0] });
  });
}

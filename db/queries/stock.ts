import type { Scope, ShopScope, SystemScope } from '../scope';
import { and, asc, desc, eq, ilike, inArray, ne, sql, type SQL } from 'drizzle-orm';
import { auditEvents, offcuts, plans, stockItems, stockMovements, users } from '../schema';
import {
  STOCK_DETAIL_FIELDS,
  type recordOffcutSchema,
  type StockDetailField,
  type StockFilter,
  type StockItemPatch,
  type StockItemValues,
} from '@/shared/schemas/stock';
import { z } from 'zod';
import { isLowStock } from '@/lib/stock/low-stock';
import { costEachCents } from './nest-request';
import { recordAudit } from './audit';
import { DomainError, notFound } from '@/lib/errors';
import type { DetailChange, MovementRow, OffcutRow, StockDetailChanges, StockItemRow } from '@/shared/wire/stock';

/** A stock-room request that cannot be done as asked (a conflict), with a message safe to show. */
export class StockConflict extends DomainError {
  constructor(message: string) {
    super('conflict', message);
  }
}

const like = (v: string) => `%${v.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;

export type { DetailChange, MovementRow, OffcutRow, StockDetailChanges, StockItemRow } from '@/shared/wire/stock';

export async function listStock({ db, shopId }: ShopScope, filter: StockFilter = {}): Promise<StockItemRow[]> {
  const where: SQL[] = [eq(stockItems.shopId, shopId)];
  if (filter.kind) where.push(eq(stockItems.kind, filter.kind));
  if (filter.material) where.push(ilike(stockItems.material, like(filter.material)));
  if (filter.thickness) where.push(ilike(stockItems.nominalThickness, like(filter.thickness)));
  if (filter.location) where.push(ilike(stockItems.location, like(filter.location)));
  const rows = await db
    .select()
    .from(stockItems)
    .where(and(...where))
    .orderBy(asc(stockItems.kind), asc(stockItems.material), asc(stockItems.thickness), asc(stockItems.length));
  return rows.map((r) => ({ ...r, free: r.onHand - r.reserved, low: isLowStock(r), valueCents: r.onHand * costEachCents(r) }));
}

/** The rack. Used offcuts are history (shown only when asked for by status). */
export async function listOffcuts({ db, shopId }: ShopScope, filter: StockFilter = {}): Promise<OffcutRow[]> {
  const where: SQL[] = [eq(offcuts.shopId, shopId)];
  where.push(filter.status ? eq(offcuts.status, filter.status) : ne(offcuts.status, 'used'));
  if (!filter.status) where.push(ne(offcuts.status, 'scrapped'));
  if (filter.material) where.push(ilike(offcuts.material, like(filter.material)));
  if (filter.location) where.push(ilike(offcuts.location, like(filter.location)));
  return db
    .select({ offcut: offcuts, planName: plans.name })
    .from(offcuts)
    .leftJoin(plans, eq(plans.id, offcuts.sourcePlanId))
    .where(and(...where))
    .orderBy(asc(offcuts.material), asc(offcuts.thickness), desc(offcuts.length))
    .then((rows) => rows.map((r) => ({ ...r.offcut, planName: r.planName })));
}

/** A new size on the rack; its opening count is a receipt in the ledger. */
export async function createStockItem({ db, shopId, userId }: Scope, values: StockItemValues) {
  return db.transaction(async (tx) => {
    const [item] = await tx
      .insert(stockItems)
      .values({ ...values, shopId })
      .returning();
    if (item.onHand > 0)
      await tx
        .insert(stockMovements)
        .values({ shopId, kind: 'received', stockItemId: item.id, quantity: item.onHand, userId, reason: 'Opening count' });
    await recordAudit(tx, { shopId, userId, action: 'create', entity: 'stock-item', entityId: item.id });
    return item;
  });
}

/** One field's change as the audit log keeps it. */

/**
 * Changes a size's details (never its counts or dimensions). Only fields whose value differs are written, and the
 * audit log keeps each as from → to, so the history can say what changed; a patch that changes nothing writes nothing.
 */
export async function updateStockItem({ db, shopId, userId }: Scope, id: string, patch: StockItemPatch) {
  return db.transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(stockItems)
      .where(and(eq(stockItems.shopId, shopId), eq(stockItems.id, id)))
      .for('update');
    if (!current) throw notFound('That stock item');
    const changes: StockDetailChanges = {};
    for (const field of STOCK_DETAIL_FIELDS) {
      const to = patch[field];
      if (to !== undefined && to !== current[field]) changes[field] = { from: current[field], to };
    }
    const fields = Object.keys(changes) as StockDetailField[];
    if (!fields.length) return current;
    const [item] = await tx
      .update(stockItems)
      .set(Object.fromEntries(fields.map((f) => [f, changes[f]!.to])))
      .where(eq(stockItems.id, id))
      .returning();
    await recordAudit(tx, { shopId, userId, action: 'update', entity: 'stock-item', entityId: id, data: { changes } });
    return item;
  });
}

export async function receiveStock({ db, shopId, userId }: Scope, id: string, { quantity, reason }: { quantity: number; reason: string }) {
  return db.transaction(async (tx) => {
    const [item] = await tx
      .update(stockItems)
      .set({ onHand: sql`${stockItems.onHand} + ${quantity}` })
      .where(and(eq(stockItems.shopId, shopId), eq(stockItems.id, id)))
      .returning();
    if (!item) throw notFound('That stock item');
    await tx.insert(stockMovements).values({ shopId, kind: 'received', stockItemId: id, quantity, userId, reason: reason || 'Received' });
    return item;
  });
}

/**
 * A counted figure replaces the book count. The row is locked while the difference is worked out, and the
 * database refuses a count below what released plans hold.
 */
export async function adjustStock({ db, shopId, userId }: Scope, id: string, { count, reason }: { count: number; reason: string }) {
  return db.transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(stockItems)
      .where(and(eq(stockItems.shopId, shopId), eq(stockItems.id, id)))
      .for('update');
    if (!current) throw notFound('That stock item');
    if (count < current.reserved) {
      throw new StockConflict(
        `${current.reserved} of these are reserved by released plans; a count of ${count} would leave them short. Cancel or re-nest those plans first.`,
      );
    }
    const delta = count - current.onHand;
    if (delta === 0) return current;
    const [item] = await tx.update(stockItems).set({ onHand: count }).where(eq(stockItems.id, id)).returning();
    await tx.insert(stockMovements).values({ shopId, kind: 'adjusted', stockItemId: id, quantity: delta, userId, reason });
    return item;
  });
}

export async function recordOffcut({ db, shopId, userId }: Scope, values: z.infer<typeof recordOffcutSchema>) {
  return db.transaction(async (tx) => {
    const [o] = await tx
      .insert(offcuts)
      .values({ ...values, shopId, status: 'available' })
      .returning();
    await tx.insert(stockMovements).values({ shopId, kind: 'offcut-created', offcutId: o.id, quantity: 1, userId, reason: 'Recorded at the saw' });
    return o;
  });
}

/** Only an offcut on the rack (not one a released plan holds) can be scrapped. */
export async function scrapOffcut({ db, shopId, userId }: Scope, id: string, reason: string) {
  return db.transaction(async (tx) => {
    const [o] = await tx
      .update(offcuts)
      .set({ status: 'scrapped' })
      .where(and(eq(offcuts.shopId, shopId), eq(offcuts.id, id), eq(offcuts.status, 'available')))
      .returning();
    if (!o) {
      const [existing] = await tx
        .select({ status: offcuts.status })
        .from(offcuts)
        .where(and(eq(offcuts.shopId, shopId), eq(offcuts.id, id)));
      if (!existing) throw notFound('That offcut');
      throw new StockConflict(`This offcut is ${existing.status}; only an available offcut can be scrapped.`);
    }
    await tx.insert(stockMovements).values({ shopId, kind: 'scrapped', offcutId: id, quantity: -1, userId, reason: reason || 'Scrapped' });
    return o;
  });
}

/** Imported rows are new sizes; all in one transaction, each with its opening receipt. */
export async function importStock({ db, shopId, userId }: Scope, items: StockItemValues[]) {
  if (!items.length) return [];
  return db.transaction(async (tx) => {
    const rows = await tx
      .insert(stockItems)
      .values(items.map((v) => ({ ...v, shopId })))
      .returning({ id: stockItems.id, onHand: stockItems.onHand });
    const receipts = rows
      .filter((r) => r.onHand > 0)
      .map((r) => ({ shopId, kind: 'received' as const, stockItemId: r.id, quantity: r.onHand, userId, reason: 'Imported from CSV' }));
    if (receipts.length) await tx.insert(stockMovements).values(receipts);
    await recordAudit(tx, { shopId, userId, action: 'import', entity: 'stock-item', data: { count: rows.length } });
    return rows;
  });
}

export async function listMovements(
  { db, shopId }: ShopScope,
  { stockItemId, offcutId, limit = 200 }: { stockItemId?: string; offcutId?: string; limit?: number } = {},
): Promise<MovementRow[]> {
  const where: SQL[] = [eq(stockMovements.shopId, shopId)];
  if (stockItemId) where.push(eq(stockMovements.stockItemId, stockItemId));
  if (offcutId) where.push(eq(stockMovements.offcutId, offcutId));
  return db
    .select({
      id: stockMovements.id,
      kind: stockMovements.kind,
      quantity: stockMovements.quantity,
      reservedChange: stockMovements.reservedChange,
      reason: stockMovements.reason,
      createdAt: stockMovements.createdAt,
      stockItemId: stockMovements.stockItemId,
      offcutId: stockMovements.offcutId,
      planId: stockMovements.planId,
      who: users.name,
      item: sql<string | null>`coalesce(${stockItems.material} || ' ' || ${stockItems.nominalThickness}, ${offcuts.material} || ' offcut')`,
    })
    .from(stockMovements)
    .leftJoin(users, eq(users.id, stockMovements.userId))
    .leftJoin(stockItems, eq(stockItems.id, stockMovements.stockItemId))
    .leftJoin(offcuts, eq(offcuts.id, stockMovements.offcutId))
    .where(and(...where))
    .orderBy(desc(stockMovements.createdAt), desc(stockMovements.id))
    .limit(limit);
}

const auditedChanges = z.object({ changes: z.record(z.string(), z.object({ from: z.unknown(), to: z.unknown() })) });

/** An audit row's data as changes; rows written before from → to was kept hold only the new values. */
function readDetailChanges(data: unknown): StockDetailChanges {
  const kept = auditedChanges.safeParse(data);
  const entries = kept.success
    ? Object.entries(kept.data.changes)
    : Object.entries(data && typeof data === 'object' ? data : {}).map(([field, to]) => [field, { from: undefined, to }] as const);
  return Object.fromEntries(entries.filter(([field]) => (STOCK_DETAIL_FIELDS as readonly string[]).includes(field)));
}

/** Changes to sizes' details (no count moved), newest first, for the history beside the ledger. */
export async function listDetailChanges(
  { db, shopId }: ShopScope,
  { stockItemId, limit = 200 }: { stockItemId?: string; limit?: number } = {},
): Promise<DetailChange[]> {
  const where: SQL[] = [eq(auditEvents.shopId, shopId), eq(auditEvents.entity, 'stock-item'), eq(auditEvents.action, 'update')];
  if (stockItemId) where.push(eq(auditEvents.entityId, stockItemId));
  const rows = await db
    .select({
      id: auditEvents.id,
      createdAt: auditEvents.createdAt,
      stockItemId: auditEvents.entityId,
      data: auditEvents.data,
      who: users.name,
      item: sql<string | null>`${stockItems.material} || ' ' || ${stockItems.nominalThickness}`,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.userId))
    .leftJoin(stockItems, and(eq(sql`${stockItems.id}::text`, auditEvents.entityId), eq(stockItems.shopId, shopId)))
    .where(and(...where))
    .orderBy(desc(auditEvents.createdAt), desc(auditEvents.id))
    .limit(limit);
  return rows.map(({ data, ...r }) => ({ ...r, changes: readDetailChanges(data) }));
}

/**
 * The ledger read back as counts: on hand = the sum of every row's on-hand change (receipts, adjustments,
 * consumption, scrapping), reserved = the sum of their reserved changes (reservations, releases, and the
 * consumption at done that cut reserved pieces). Equal to the stored counts for every item when nothing bypassed
 * the ledger.
 */
export async function ledgerCounts({ db, shopId }: ShopScope) {
  const rows = await db
    .select({
      stockItemId: stockMovements.stockItemId,
      offcutId: stockMovements.offcutId,
      onHand: sql<number>`coalesce(sum(${stockMovements.quantity}), 0)`.mapWith(Number),
      reserved: sql<number>`coalesce(sum(${stockMovements.reservedChange}), 0)`.mapWith(Number),
    })
    .from(stockMovements)
    .where(eq(stockMovements.shopId, shopId))
    .groupBy(stockMovements.stockItemId, stockMovements.offcutId);
  return rows;
}

/** Rack value at cost: sheets each, boards by their board feet, offcuts at their carried share. */
export async function stockValue({ db, shopId }: ShopScope) {
  const [items, rack] = await Promise.all([
    db.select().from(stockItems).where(eq(stockItems.shopId, shopId)),
    db
      .select({ cents: sql<number>`coalesce(sum(${offcuts.costCents}), 0)`.mapWith(Number) })
      .from(offcuts)
      .where(and(eq(offcuts.shopId, shopId), inArray(offcuts.status, ['available', 'reserved']))),
  ]);
  const stockCents = items.reduce((sum, i) => sum + i.onHand * costEachCents(i), 0);
  return { stockCents, offcutCents: rack[0]?.cents ?? 0, totalCents: stockCents + (rack[0]?.cents ?? 0) };
}

/**
 * Opening counts for stock that reached the database without a ledger row (a seeded or migrated rack): one receipt
 * per size and one "offcut created" per offcut, so the ledger sums to the counts from then on.
 */
export async function recordOpeningCounts({ db, shopId, userId }: SystemScope) {
  await db.transaction(async (tx) => {
    const booked = await tx
      .select({ stockItemId: stockMovements.stockItemId, offcutId: stockMovements.offcutId })
      .from(stockMovements)
      .where(eq(stockMovements.shopId, shopId));
    const hasRow = new Set(booked.flatMap((b) => [b.stockItemId, b.offcutId]).filter(Boolean));
    const items = await tx.select().from(stockItems).where(eq(stockItems.shopId, shopId));
    const rack = await tx
      .select()
      .from(offcuts)
      .where(and(eq(offcuts.shopId, shopId), inArray(offcuts.status, ['available', 'reserved'])));
    const moves = [
      ...items
        .filter((i) => i.onHand > 0 && !hasRow.has(i.id))
        .map((i) => ({ shopId, kind: 'received' as const, stockItemId: i.id, quantity: i.onHand, userId, reason: 'Opening count' })),
      ...rack
        .filter((o) => !hasRow.has(o.id))
        .map((o) => ({ shopId, kind: 'offcut-created' as const, offcutId: o.id, quantity: 1, userId, reason: 'Opening count' })),
    ];
    if (moves.length) await tx.insert(stockMovements).values(moves);
  });
}

/**
 * The catalogue is the stock sizes marked buyable (on hand or not): one row per size keeps a single price per size,
 * and the nesting request already offers each as `buy:<id>`. Adding a size to buy is a new stock size with 0 on hand.
 */
export async function listCatalogue({ db, shopId }: ShopScope) {
  const rows = await db
    .select()
    .from(stockItems)
    .where(and(eq(stockItems.shopId, shopId), eq(stockItems.buyable, true)))
    .orderBy(asc(stockItems.kind), asc(stockItems.material), asc(stockItems.thickness));
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    material: r.material,
    nominalThickness: r.nominalThickness,
    thickness: r.thickness,
    length: r.length,
    width: r.width,
    grain: r.grain,
    supplier: r.supplier,
    costCents: r.costCents,
    costEachCents: costEachCents(r),
  }));
}

/**
 * Every stock size and offcut whose stored counts differ from what its ledger rows add up to (empty when the ledger
 * and the counts agree). An offcut on the rack counts 1 on hand, and 1 reserved while a released plan holds it.
 */
export async function ledgerMismatches({ db, shopId }: ShopScope) {
  const [ledger, items, rack] = await Promise.all([
    ledgerCounts({ db, shopId }),
    db.select().from(stockItems).where(eq(stockItems.shopId, shopId)),
    db.select().from(offcuts).where(eq(offcuts.shopId, shopId)),
  ]);
  const booked = (pick: (l: (typeof ledger)[number]) => boolean) => ledger.find(pick) ?? { onHand: 0, reserved: 0 };
  const stored = [
    ...items.map((i) => ({
      what: `${i.material} ${i.nominalThickness} (${i.id})`,
      onHand: i.onHand,
      reserved: i.reserved,
      ledger: booked((l) => l.stockItemId === i.id),
    })),
    ...rack.map((o) => ({
      what: `${o.material} offcut (${o.id})`,
      onHand: o.status === 'available' || o.status === 'reserved' ? 1 : 0,
      reserved: o.status === 'reserved' ? 1 : 0,
      ledger: booked((l) => l.offcutId === o.id),
    })),
  ];
  return stored
    .filter((s) => s.onHand !== s.ledger.onHand || s.reserved !== s.ledger.reserved)
    .map((s) => ({
      what: s.what,
      stored: { onHand: s.onHand, reserved: s.reserved },
      ledger: { onHand: s.ledger.onHand, reserved: s.ledger.reserved },
    }));
}

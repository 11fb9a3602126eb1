import type { Scope, ShopScope } from '../scope';
import type { PurchaseOrderLineView, PurchaseOrderView } from '@/shared/wire/buying';
import { and, asc, desc, eq, inArray, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { plans, purchaseOrderLines, purchaseOrders, shops, stockItems, stockMovements, suppliers } from '../schema';
import { groupBySupplier, lowStockOrders, piecesToBuy, type SupplierOrder } from '@/lib/buying/order-lines';
import { poNumber, type PoStatus } from '@/lib/buying/describe';
import { costEachCents } from '@/lib/stock/pricing';
import { quoteNominal } from '@/lib/quotes/quote-text';
import { isLowStock } from '@/lib/stock/low-stock';
import type { PurchaseOrderPatch, ReceivePurchaseOrder } from '@/shared/schemas/purchase-order';
import { recordAudit } from './audit';
import { getTakeoff } from './takeoff';
import { invalid, notFound, conflict } from '@/lib/errors';

/** Statuses of an order still to come in: its sizes are "on order". */
export const OPEN_STATUSES = ['draft', 'sent', 'part-received'] as const satisfies readonly PoStatus[];

export type { PurchaseOrderLineView, PurchaseOrderView };

const iso = (d: Date | null) => (d ? d.toISOString() : null);

async function linesOf(db: Db, shopId: string, orderIds: string[]): Promise<Map<string, PurchaseOrderLineView[]>> {
  const out = new Map<string, PurchaseOrderLineView[]>();
  if (!orderIds.length) return out;
  const rows = await db
    .select({ line: purchaseOrderLines, item: stockItems })
    .from(purchaseOrderLines)
    .innerJoin(stockItems, eq(stockItems.id, purchaseOrderLines.stockItemId))
    .where(and(eq(purchaseOrderLines.shopId, shopId), inArray(purchaseOrderLines.purchaseOrderId, orderIds)))
    .orderBy(asc(purchaseOrderLines.position), asc(stockItems.material), asc(stockItems.thickness));
  for (const { line, item } of rows) {
    const each = costEachCents({ ...item, costCents: line.unitCostCents });
    const list = out.get(line.purchaseOrderId) ?? [];
    list.push({
      id: line.id,
      stockItemId: item.id,
      kind: item.kind,
      material: item.material,
      nominalThickness: item.nominalThickness,
      thickness: item.thickness,
      length: item.length,
      width: item.width,
      surfacing: item.surfacing,
      grade: item.grade,
      stockCostCents: item.costCents,
      onHand: item.onHand,
      quantity: line.quantity,
      unitCostCents: line.unitCostCents,
      costEachCents: each,
      totalCents: each * line.quantity,
      received: line.received,
    });
    out.set(line.purchaseOrderId, list);
  }
  return out;
}

type OrderRow = typeof purchaseOrders.$inferSelect & { planName: string | null; jobId: string | null };

function toView(row: OrderRow, lines: PurchaseOrderLineView[]): PurchaseOrderView {
  return {
    id: row.id,
    number: row.number,
    title: poNumber(row.number),
    supplier: row.supplier,
    supplierEmail: row.supplierEmail,
    status: row.status,
    source: row.source as PurchaseOrderView['source'],
    planId: row.planId,
    planName: row.planName,
    jobId: row.jobId,
    currency: row.currency,
    note: row.note,
    sentAt: iso(row.sentAt),
    receivedAt: iso(row.receivedAt),
    cancelledAt: iso(row.cancelledAt),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    lines,
    totalCents: lines.reduce((n, l) => n + l.totalCents, 0),
  };
}

const orderColumns = { order: purchaseOrders, planName: plans.name, jobId: plans.jobId };

/** The shop's purchase orders, newest first, with their lines. */
export async function listPurchaseOrders({ db, shopId }: ShopScope): Promise<PurchaseOrderView[]> {
  const rows = await db
    .select(orderColumns)
    .from(purchaseOrders)
    .leftJoin(plans, eq(plans.id, purchaseOrders.planId))
    .where(eq(purchaseOrders.shopId, shopId))
    .orderBy(desc(purchaseOrders.number));
  const lines = await linesOf(
    db,
    shopId,
    rows.map((r) => r.order.id),
  );
  return rows.map((r) => toView({ ...r.order, planName: r.planName, jobId: r.jobId }, lines.get(r.order.id) ?? []));
}

export async function getPurchaseOrder({ db, shopId }: ShopScope, id: string): Promise<PurchaseOrderView> {
  const [r] = await db
    .select(orderColumns)
    .from(purchaseOrders)
    .leftJoin(plans, eq(plans.id, purchaseOrders.planId))
    .where(and(eq(purchaseOrders.shopId, shopId), eq(purchaseOrders.id, id)));
  if (!r) throw notFound('That purchase order');
  const lines = await linesOf(db, shopId, [id]);
  return toView({ ...r.order, planName: r.planName, jobId: r.jobId }, lines.get(id) ?? []);
}

/** Pieces per stock size still to come in on open orders (ordered less received). */
export async function onOrderQuantities({ db, shopId }: ShopScope): Promise<Map<string, number>> {
  const rows = await db
    .select({
      stockItemId: purchaseOrderLines.stockItemId,
      n: sql<number>`sum(${purchaseOrderLines.quantity} - ${purchaseOrderLines.received})`.mapWith(Number),
    })
    .from(purchaseOrderLines)
    .innerJoin(purchaseOrders, eq(purchaseOrders.id, purchaseOrderLines.purchaseOrderId))
    .where(and(eq(purchaseOrderLines.shopId, shopId), inArray(purchaseOrders.status, [...OPEN_STATUSES])))
    .groupBy(purchaseOrderLines.stockItemId);
  return new Map(rows.map((r) => [r.stockItemId, r.n]));
}

/** The stock sizes running low, each with what open orders bring of it. */
export async function lowStockWithOrders({ db, shopId }: ShopScope) {
  const [items, onOrder] = await Promise.all([
    db
      .select()
      .from(stockItems)
      .where(eq(stockItems.shopId, shopId))
      .orderBy(asc(stockItems.kind), asc(stockItems.material), asc(stockItems.thickness)),
    onOrderQuantities({ db, shopId }),
  ]);
  return items.filter(isLowStock).map((i) => ({ ...i, free: i.onHand - i.reserved, onOrder: onOrder.get(i.id) ?? 0 }));
}

/** The e-mail address kept for each supplier name (lower-cased key). */
async function supplierEmails(db: Db, shopId: string): Promise<Map<string, string>> {
  const rows = await db.select({ name: suppliers.name, email: suppliers.email }).from(suppliers).where(eq(suppliers.shopId, shopId));
  return new Map(rows.map((r) => [r.name.trim().toLowerCase(), r.email]));
}

/** Keeps a supplier's address for the next order (one row per name). */
async function rememberSupplierEmail(tx: Db, shopId: string, name: string, email: string) {
  if (!name.trim() || !email) return;
  // The unique index is on lower(name): the conflict target names the same expression.
  await tx.execute(
    sql`insert into ${suppliers} (shop_id, name, email) values (${shopId}, ${name.trim()}, ${email}) on conflict (shop_id, lower(name)) do update set email = excluded.email`,
  );
}

async function insertOrders(
  db: Db,
  shopId: string,
  userId: string,
  orders: SupplierOrder[],
  source: 'plan' | 'low-stock' | 'manual',
  planId: string | null,
): Promise<string[]> {
  const emails = await supplierEmails(db, shopId);
  return db.transaction(async (tx) => {
    // The shop row is locked so two orders made at once never take one number.
    const [shop] = await tx.select({ currency: shops.currency }).from(shops).where(eq(shops.id, shopId)).for('update');
    const [{ last }] = await tx
      .select({ last: sql<number>`coalesce(max(${purchaseOrders.number}), 0)`.mapWith(Number) })
      .from(purchaseOrders)
      .where(eq(purchaseOrders.shopId, shopId));
    const ids: string[] = [];
    for (const [i, o] of orders.entries()) {
      const supplier = o.supplier || 'Supplier to choose';
      const [row] = await tx
        .insert(purchaseOrders)
        .values({
          shopId,
          number: last + 1 + i,
          supplier,
          supplierEmail: emails.get(o.supplier.toLowerCase()) ?? '',
          source,
          planId,
          currency: shop.currency,
          createdBy: userId,
        })
        .returning({ id: purchaseOrders.id, number: purchaseOrders.number });
      if (o.lines.length)
        await tx.insert(purchaseOrderLines).values(o.lines.map((l, position) => ({ ...l, shopId, purchaseOrderId: row.id, position })));
      await recordAudit(tx, {
        shopId,
        userId,
        action: 'create',
        entity: 'purchase-order',
        entityId: row.id,
        data: { number: row.number, source, planId, lines: o.lines.length },
      });
      ids.push(row.id);
    }
    return ids;
  });
}

/** One draft per supplier for the sizes running low (up to twice their mark, less what open orders bring). */
export async function createFromLowStock({ db, shopId, userId }: Scope): Promise<string[]> {
  const [items, onOrder] = await Promise.all([
    db
      .select()
      .from(stockItems)
      .where(eq(stockItems.shopId, shopId))
      .orderBy(asc(stockItems.material), asc(stockItems.thickness), asc(stockItems.length)),
    onOrderQuantities({ db, shopId }),
  ]);
  const orders = lowStockOrders(items, onOrder);
  if (!orders.length) throw conflict('Nothing is running low that open orders do not already bring: no order to make.');
  return insertOrders(db, shopId, userId, orders, 'low-stock', null);
}

/** One draft per supplier for a plan's stock to buy (sizes it buys, and what the rack is short of for the rest). */
export async function createFromPlan({ db, shopId, userId }: Scope, planId: string): Promise<string[]> {
  const [plan] = await db
    .select({ jobId: plans.jobId, status: plans.status })
    .from(plans)
    .where(and(eq(plans.shopId, shopId), eq(plans.id, planId)));
  if (!plan) throw notFound('That plan');
  if (plan.status === 'cancelled') throw conflict('That plan was cancelled: nothing to buy for it.');
  const takeoff = await getTakeoff({ db, shopId }, plan.jobId, planId);
  if (!takeoff) throw notFound('That plan');
  const lines = [...takeoff.pull, ...takeoff.buy].map((l) => ({
    source: l.source,
    stockItemId: l.stockId.replace(/^(buy|stock):/, ''),
    count: l.count,
    free: l.free,
    heldByPlan: l.heldByPlan,
  }));
  const wanted = piecesToBuy(lines);
  if (!wanted.size) throw conflict('The stock room covers this plan: nothing to buy.');
  const items = await db
    .select()
    .from(stockItems)
    .where(and(eq(stockItems.shopId, shopId), inArray(stockItems.id, [...wanted.keys()])))
    .orderBy(asc(stockItems.material), asc(stockItems.thickness));
  return insertOrders(db, shopId, userId, groupBySupplier(wanted, items), 'plan', planId);
}

/** An empty draft for one supplier, to fill by hand. */
export async function createManual({ db, shopId, userId }: Scope, supplier: string): Promise<string[]> {
  return insertOrders(db, shopId, userId, [{ supplier, lines: [] }], 'manual', null);
}

async function lockOrder(tx: Db, shopId: string, id: string) {
  const [row] = await tx
    .select()
    .from(purchaseOrders)
    .where(and(eq(purchaseOrders.shopId, shopId), eq(purchaseOrders.id, id)))
    .for('update');
  if (!row) throw notFound('That purchase order');
  return row;
}

/** Changes a draft (supplier, address, note, lines); a sent order stays as the supplier has it (409). */
export async function updateDraft({ db, shopId, userId }: Scope, id: string, patch: PurchaseOrderPatch): Promise<PurchaseOrderView> {
  await db.transaction(async (tx) => {
    const row = await lockOrder(tx, shopId, id);
    if (row.status !== 'draft') throw conflict(`${poNumber(row.number)} was sent and stays as the supplier has it; only a draft can be changed.`);
    if (patch.lines) {
      const ids = patch.lines.map((l) => l.stockItemId);
      const found = ids.length
        ? await tx
            .select({ id: stockItems.id })
            .from(stockItems)
            .where(and(eq(stockItems.shopId, shopId), inArray(stockItems.id, ids)))
        : [];
      const missing = patch.lines.findIndex((l) => !found.some((f) => f.id === l.stockItemId));
      if (missing >= 0)
        throw invalid(`Line ${missing + 1} names a stock size this shop does not have.`, {
          [`lines.${missing}.stockItemId`]: ['Pick one of the stock room’s sizes.'],
        });
      await tx.delete(purchaseOrderLines).where(eq(purchaseOrderLines.purchaseOrderId, id));
      if (patch.lines.length)
        await tx.insert(purchaseOrderLines).values(patch.lines.map((l, position) => ({ ...l, shopId, purchaseOrderId: id, position })));
    }
    const set: Partial<typeof purchaseOrders.$inferInsert> = { updatedAt: new Date() };
    if (patch.supplier !== undefined) set.supplier = patch.supplier;
    if (patch.supplierEmail !== undefined) set.supplierEmail = patch.supplierEmail;
    if (patch.note !== undefined) set.note = patch.note;
    await tx.update(purchaseOrders).set(set).where(eq(purchaseOrders.id, id));
    if (patch.supplierEmail) await rememberSupplierEmail(tx, shopId, patch.supplier ?? row.supplier, patch.supplierEmail);
    await recordAudit(tx, {
      shopId,
      userId,
      action: 'update',
      entity: 'purchase-order',
      entityId: id,
      data: { fields: Object.keys(patch), lines: patch.lines?.length },
    });
  });
  return getPurchaseOrder({ db, shopId }, id);
}

/**
 * Marks a draft sent, in the transaction that queues its mail (`enqueue`, given the locked order). Refused when it
 * is no longer a draft, has no lines or no address, or changed since the caller read it (`seenUpdatedAt`): the PDF
 * attached must be the order as sent.
 */
export async function markSent({ db, shopId, userId }: Scope, id: string, seenUpdatedAt: string, enqueue: (tx: Db) => Promise<{ id: string }>) {
  return db.transaction(async (tx) => {
    const row = await lockOrder(tx, shopId, id);
    if (row.status !== 'draft') throw conflict(`${poNumber(row.number)} was already sent.`);
    if (row.updatedAt.toISOString() !== seenUpdatedAt)
      throw conflict(`${poNumber(row.number)} changed while it was being sent: look it over and send it again.`);
    const [{ n }] = await tx
      .select({ n: sql<number>`count(*)`.mapWith(Number) })
      .from(purchaseOrderLines)
      .where(eq(purchaseOrderLines.purchaseOrderId, id));
    if (n === 0) throw invalid('An order with no lines cannot be sent: add what to buy.');
    if (!row.supplierEmail)
      throw invalid('Add the supplier’s e-mail address to send the order.', { supplierEmail: ['Type the supplier’s e-mail address.'] });
    const mail = await enqueue(tx);
    await tx.update(purchaseOrders).set({ status: 'sent', sentAt: new Date(), updatedAt: new Date() }).where(eq(purchaseOrders.id, id));
    await rememberSupplierEmail(tx, shopId, row.supplier, row.supplierEmail);
    await recordAudit(tx, {
      shopId,
      userId,
      action: 'send',
      entity: 'purchase-order',
      entityId: id,
      data: { to: row.supplierEmail, mailId: mail.id },
    });
  });
}

/** Cancels an order nothing has arrived on (draft or sent); one with pieces received is kept. */
export async function cancelPurchaseOrder({ db, shopId, userId }: Scope, id: string): Promise<PurchaseOrderView> {
  await db.transaction(async (tx) => {
    const row = await lockOrder(tx, shopId, id);
    if (row.status !== 'draft' && row.status !== 'sent')
      throw conflict(
        `${poNumber(row.number)} is ${row.status === 'cancelled' ? 'already cancelled' : row.status.replace('-', ' ')}: only a draft or a sent order with nothing received can be cancelled.`,
      );
    await tx.update(purchaseOrders).set({ status: 'cancelled', cancelledAt: new Date(), updatedAt: new Date() }).where(eq(purchaseOrders.id, id));
    await recordAudit(tx, { shopId, userId, action: 'cancel', entity: 'purchase-order', entityId: id });
  });
  return getPurchaseOrder({ db, shopId }, id);
}

/**
 * Receives pieces against a sent order, all in one transaction: each line's count goes onto its stock size with a
 * 'received' movement naming the order, the line keeps what arrived, and the order becomes part received or
 * received. Receiving more than a line still waits for is refused (409, naming the line); so is receiving nothing.
 * `all` receives everything each line still waits for.
 * With `updateCosts`, each received size's cost in the stock room becomes this order's unit cost.
 */
export async function receivePurchaseOrder(
  scope: Scope,
  id: string,
  input: Pick<ReceivePurchaseOrder, 'lines' | 'updateCosts'> & Partial<Pick<ReceivePurchaseOrder, 'all' | 'note'>>,
): Promise<PurchaseOrderView> {
  const { db, shopId, userId } = scope;
  await db.transaction(async (tx) => {
    const row = await lockOrder(tx, shopId, id);
    const title = poNumber(row.number);
    if (row.status === 'draft') throw conflict(`${title} is still a draft: send it before receiving against it.`);
    if (row.status !== 'sent' && row.status !== 'part-received') throw conflict(`${title} is ${row.status}: nothing more can be received on it.`);
    const lines = await tx
      .select({ line: purchaseOrderLines, item: stockItems })
      .from(purchaseOrderLines)
      .innerJoin(stockItems, eq(stockItems.id, purchaseOrderLines.stockItemId))
      .where(eq(purchaseOrderLines.purchaseOrderId, id))
      .for('update');
    const wanted = arrivals(lines, input, title);
    const reason = `Received on ${title}${input.note ? ` — ${input.note}` : ''}`;
    for (const w of wanted)
      await receiveLine({ ...scope, db: tx }, id, lines.find((l) => l.line.id === w.lineId)!, w.quantity, { reason, updateCosts: input.updateCosts });
    const done = lines.every(({ line }) => line.received + (wanted.find((w) => w.lineId === line.id)?.quantity ?? 0) >= line.quantity);
    await tx
      .update(purchaseOrders)
      .set({ status: done ? 'received' : 'part-received', receivedAt: done ? new Date() : null, updatedAt: new Date() })
      .where(eq(purchaseOrders.id, id));
    await recordAudit(tx, {
      shopId,
      userId,
      action: 'receive',
      entity: 'purchase-order',
      entityId: id,
      data: { lines: wanted, updateCosts: input.updateCosts },
    });
  });
  return getPurchaseOrder(scope, id);
}

type LockedLine = { line: typeof purchaseOrderLines.$inferSelect; item: typeof stockItems.$inferSelect };

/**
 * What came in, line by line: every open quantity for "all", else the lines the receiver counted. Refuses a line not
 * on the order, nothing at all, and more than a line still has open (extra pieces are a receipt in the stock room).
 */
function arrivals(lines: LockedLine[], input: Pick<ReceivePurchaseOrder, 'lines'> & { all?: boolean }, title: string) {
  const wanted = input.all
    ? lines.filter((l) => l.line.quantity > l.line.received).map((l) => ({ lineId: l.line.id, quantity: l.line.quantity - l.line.received }))
    : input.lines.filter((l) => l.quantity > 0);
  if (!wanted.length) throw invalid('Say how many pieces came on at least one line.');
  for (const w of input.lines) if (!lines.some((l) => l.line.id === w.lineId)) throw invalid(`A line named is not on ${title}.`);
  for (const w of wanted) {
    const { line, item } = lines.find((l) => l.line.id === w.lineId)!;
    const open = line.quantity - line.received;
    if (w.quantity > open) {
      throw conflict(
        `${item.material} ${quoteNominal(item.nominalThickness)}: ${line.quantity} ordered and ${line.received} already received, so ${open} more can come in, not ${w.quantity}. Record extra pieces as a receipt in the stock room.`,
      );
    }
  }
  return wanted;
}

/** One line's arrival: the line's received count, the size's count (and cost, when asked), a movement naming the order. */
async function receiveLine(
  { db: tx, shopId, userId }: Scope,
  orderId: string,
  { line, item }: LockedLine,
  quantity: number,
  { reason, updateCosts }: { reason: string; updateCosts: boolean },
) {
  await tx
    .update(purchaseOrderLines)
    .set({ received: line.received + quantity })
    .where(eq(purchaseOrderLines.id, line.id));
  const set: Partial<typeof stockItems.$inferInsert> = { onHand: sql`${stockItems.onHand} + ${quantity}` as never };
  if (updateCosts && line.unitCostCents !== item.costCents) set.costCents = line.unitCostCents;
  await tx
    .update(stockItems)
    .set(set)
    .where(and(eq(stockItems.shopId, shopId), eq(stockItems.id, item.id)));
  await tx.insert(stockMovements).values({ shopId, kind: 'received', stockItemId: item.id, quantity, userId, reason, purchaseOrderId: orderId });
  if (set.costCents !== undefined) {
    await recordAudit(tx, {
      shopId,
      userId,
      action: 'update',
      entity: 'stock-item',
      entityId: item.id,
      data: { changes: { costCents: { from: item.costCents, to: line.unitCostCents } }, purchaseOrderId: orderId },
    });
  }
}

/** The buying settings kept on the shop. */
export async function getBuyingSettings({ db, shopId }: ShopScope) {
  const [row] = await db
    .select({ purchaseOrderDetails: shops.purchaseOrderDetails, lowStockDigestTime: shops.lowStockDigestTime })
    .from(shops)
    .where(eq(shops.id, shopId));
  if (!row) throw notFound('The shop');
  return row;
}

export async function updateBuyingSettings({ db, shopId, userId }: Scope, patch: { purchaseOrderDetails?: string; lowStockDigestTime?: string }) {
  if (Object.keys(patch).length) {
    await db.transaction(async (tx) => {
      await tx.update(shops).set(patch).where(eq(shops.id, shopId));
      await recordAudit(tx, { shopId, userId, action: 'update', entity: 'shop-settings', entityId: shopId, data: patch });
    });
  }
  return getBuyingSettings({ db, shopId });
}

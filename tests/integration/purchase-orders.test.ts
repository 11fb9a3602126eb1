import bcrypt from 'bcryptjs';
import { and, eq } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { Db } from '@/db/open';
import { auditEvents, mailOutbox, plans, purchaseOrderLines, purchaseOrders, shops, stockItems, stockMovements, users } from '@/db/schema';
import {
  cancelPurchaseOrder,
  createFromLowStock,
  createFromPlan,
  getPurchaseOrder,
  onOrderQuantities,
  receivePurchaseOrder,
  updateDraft,
} from '@/db/queries/purchase-orders';
import { ledgerMismatches } from '@/db/queries/stock';
import { sendPurchaseOrder } from '@/server/buying/send';
import { readPlan } from '@/lib/nesting';
import * as listRoute from '@/app/api/purchase-orders/route';
import * as orderRoute from '@/app/api/purchase-orders/[id]/route';
import * as receiveRoute from '@/app/api/purchase-orders/[id]/receive/route';
import { call, jobWithSheet, nestAndSave } from '../support/shop-day';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { nextNumber } from '../support/unique';
import type { TestUser } from '../support/fixtures';

let db: Db;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ db, fx } = app));

/** A shop of its own for one test (its low stock is only what the test puts there), with an owner. */
async function freshShop(name = `Test shop ${nextNumber()}`) {
  const [shop] = await db.insert(shops).values({ name, timeZone: 'America/Chicago' }).returning();
  const [u] = await db
    .insert(users)
    .values({
      shopId: shop.id,
      email: `owner-${nextNumber()}@shop.example`,
      name: 'Rowan Ash',
      role: 'owner',
      passwordHash: await bcrypt.hash('x', 4),
    })
    .returning();
  const owner: TestUser = { id: u.id, shopId: shop.id, role: 'owner', tokenVersion: u.tokenVersion };
  return { shop, owner };
}

type Size = Partial<typeof stockItems.$inferInsert>;
async function size(shopId: string, over: Size) {
  const [item] = await db
    .insert(stockItems)
    .values({
      shopId,
      kind: 'sheet',
      material: `Ply ${nextNumber()}`,
      nominalThickness: '3/4"',
      thickness: 18,
      length: 2440,
      width: 1220,
      onHand: 0,
      costCents: 5000,
      ...over,
    })
    .returning();
  if (item.onHand)
    await db.insert(stockMovements).values({ shopId, kind: 'received', stockItemId: item.id, quantity: item.onHand, reason: 'Opening count' });
  return item;
}

const count = async (id: string) => (await db.select().from(stockItems).where(eq(stockItems.id, id)))[0];

describe('purchase orders from the low stock', () => {
  test('one draft per supplier, numbered per shop, each size up to twice its mark less what is on order (hand-worked)', async () => {
    const { shop, owner } = await freshShop();
    const mdf = await size(shop.id, { supplier: 'Hollow Creek Supply', onHand: 2, lowStockAt: 3, costCents: 3400 }); // 6 − 2 = 4
    const birch = await size(shop.id, { supplier: 'Cedar Run Plywood', onHand: 8, reserved: 6, lowStockAt: 3, costCents: 8900 }); // 2 free → 6 − 2 = 4
    await size(shop.id, { supplier: 'Cedar Run Plywood', onHand: 9, lowStockAt: 3 }); // not low
    const ids = await createFromLowStock({ db, shopId: shop.id, userId: owner.id });
    const orders = await Promise.all(ids.map((id) => getPurchaseOrder({ db, shopId: shop.id }, id)));
    expect(orders.map((o) => [o!.title, o!.supplier, o!.status, o!.source])).toEqual([
      ['PO-0001', 'Cedar Run Plywood', 'draft', 'low-stock'],
      ['PO-0002', 'Hollow Creek Supply', 'draft', 'low-stock'],
    ]);
    expect(orders[0]!.lines.map((l) => [l.stockItemId, l.quantity, l.unitCostCents, l.totalCents])).toEqual([[birch.id, 4, 8900, 35600]]);
    expect(orders[1]!.lines.map((l) => [l.stockItemId, l.quantity, l.totalCents])).toEqual([[mdf.id, 4, 13600]]);
    expect(orders[1]!.totalCents).toBe(13600);
    // Now both are on order: nothing more to order, and the stock room says what is coming.
    expect(Object.fromEntries(await onOrderQuantities({ db, shopId: shop.id }))).toEqual({ [mdf.id]: 4, [birch.id]: 4 });
    await expect(createFromLowStock({ db, shopId: shop.id, userId: owner.id })).rejects.toMatchObject({ kind: 'conflict' });
  });

  test('numbers are per shop: another shop’s first order is PO-0001 too, and never holds this shop’s sizes', async () => {
    const a = await freshShop();
    const b = await freshShop();
    const mine = await size(a.shop.id, { supplier: 'Cedar Run Plywood', onHand: 0, lowStockAt: 2 });
    const theirs = await size(b.shop.id, { supplier: 'Cedar Run Plywood', onHand: 1, lowStockAt: 2 });
    const [pa] = await createFromLowStock({ db, shopId: a.shop.id, userId: a.owner.id });
    const [pb] = await createFromLowStock({ db, shopId: b.shop.id, userId: b.owner.id });
    const [oa, ob] = [await getPurchaseOrder({ db, shopId: a.shop.id }, pa), await getPurchaseOrder({ db, shopId: b.shop.id }, pb)];
    expect([oa!.title, ob!.title]).toEqual(['PO-0001', 'PO-0001']);
    expect(oa!.lines.map((l) => l.stockItemId)).toEqual([mine.id]);
    expect(ob!.lines.map((l) => [l.stockItemId, l.quantity])).toEqual([[theirs.id, 3]]);
    await expect(getPurchaseOrder({ db, shopId: b.shop.id }, pa)).rejects.toMatchObject({ kind: 'not-found' });
  });

  test('the list route is the shop’s own; a cutter is refused', async () => {
    const mineList = await call(listRoute.GET, '/api/purchase-orders', '', fx.owner);
    expect(mineList.status).toBe(200);
    const made = await call(listRoute.POST, '/api/purchase-orders', '', fx.estimator, {
      method: 'POST',
      body: { from: 'manual', supplier: 'Matrix Supply' },
    });
    expect(made.status).toBe(201);
    const theirs = await call(listRoute.GET, '/api/purchase-orders', '', fx.otherOwner);
    expect(theirs.body.map((o: { id: string }) => o.id)).not.toContain(made.body.orders[0].id);
    expect((await call(listRoute.GET, '/api/purchase-orders', '', fx.cutter)).status).toBe(403);
  });
});

describe('purchase orders from a plan’s stock to buy', () => {
  test('every piece the plan buys, and what the rack is short of, on one draft for the size’s supplier', async () => {
    // 12 parts of 1000 × 500 on 2440 × 1220 sheets: more sheets than the 1 on the rack.
    const { job, sheet } = await jobWithSheet(db, fx.mine.id, { parts: [{ label: 'Shelf', quantity: 12, length: 1000, width: 500 }], onHand: 1 });
    await db.update(stockItems).set({ buyable: true, supplier: 'Cedar Run Plywood', costCents: 6000 }).where(eq(stockItems.id, sheet.id));
    const { id: planId } = await nestAndSave(fx.estimator, job.id);
    const [row] = await db.select().from(plans).where(eq(plans.id, planId));
    const pieces = readPlan(row.document).pieces;
    const bought = pieces.filter((p) => p.stockId === `buy:${sheet.id}`).length;
    const pulled = pieces.filter((p) => p.stockId === `stock:${sheet.id}`).length;
    expect(bought).toBeGreaterThan(0);
    const [poId] = await createFromPlan({ db, shopId: fx.mine.id, userId: fx.estimator.id }, planId);
    const po = await getPurchaseOrder({ db, shopId: fx.mine.id }, poId);
    // The 1 free sheet covers the pulled piece; every bought piece is ordered.
    expect(po!.lines.map((l) => [l.stockItemId, l.quantity, l.unitCostCents])).toEqual([[sheet.id, bought + Math.max(0, pulled - 1), 6000]]);
    expect([po!.supplier, po!.source, po!.planId, po!.planName]).toEqual(['Cedar Run Plywood', 'plan', planId, 'Plan']);
    // Another shop cannot order from this plan.
    await expect(createFromPlan({ db, shopId: fx.theirs.id, userId: fx.otherOwner.id }, planId)).rejects.toMatchObject({ kind: 'not-found' });
  });
});

describe('a draft, sent, received', () => {
  async function draftFor(over: Size = {}) {
    const { shop, owner } = await freshShop();
    const sheet = await size(shop.id, { supplier: 'Cedar Run Plywood', onHand: 1, lowStockAt: 3, costCents: 8900, ...over });
    const board = await size(shop.id, {
      kind: 'board',
      material: 'White oak',
      nominalThickness: '4/4',
      thickness: 20.6,
      length: 2438.4,
      width: 165.1,
      supplier: 'Cedar Run Plywood',
      onHand: 0,
      lowStockAt: 0,
      costCents: 925,
    });
    const [id] = await createFromLowStock({ db, shopId: shop.id, userId: owner.id });
    return { shop, owner, sheet, board, id };
  }

  test('lines are edited while a draft (a board priced by the board foot), then kept as sent', async () => {
    const { shop, owner, sheet, board, id } = await draftFor();
    const po = await updateDraft({ db, shopId: shop.id, userId: owner.id }, id, {
      supplierEmail: 'orders@cedarrun.example',
      note: 'Back door',
      lines: [
        { stockItemId: sheet.id, quantity: 6, unitCostCents: 8500 },
        { stockItemId: board.id, quantity: 10, unitCostCents: 925 },
      ],
    });
    // By hand: 6 × $85.00 = $510.00; a 4/4 board 96″ × 6½″ is 4.33 bd ft → $40.08 each (AHEC, "Measurement"), 10 = $400.80.
    expect(po.lines.map((l) => [l.quantity, l.costEachCents, l.totalCents])).toEqual([
      [6, 8500, 51000],
      [10, 4008, 40080],
    ]);
    expect(po.totalCents).toBe(91080);
    // A size of another shop is refused, naming the line.
    const { shop: other } = await freshShop();
    const foreign = await size(other.id, {});
    await expect(
      updateDraft({ db, shopId: shop.id, userId: owner.id }, id, { lines: [{ stockItemId: foreign.id, quantity: 1, unitCostCents: 1 }] }),
    ).rejects.toMatchObject({ kind: 'invalid' });
    await sendPurchaseOrder(db, shop.id, owner.id, id);
    await expect(updateDraft({ db, shopId: shop.id, userId: owner.id }, id, { note: 'Changed' })).rejects.toMatchObject({ kind: 'conflict' });
  });

  test('sending queues the mail with the PDF and marks it sent in one transaction; a bad address sends nothing and keeps the draft', async () => {
    const { shop, owner, id } = await draftFor();
    // An address the outbox refuses (written behind the form's back): the whole send rolls back.
    await db.update(purchaseOrders).set({ supplierEmail: 'not an address' }).where(eq(purchaseOrders.id, id));
    await expect(sendPurchaseOrder(db, shop.id, owner.id, id)).rejects.toThrow();
    expect((await getPurchaseOrder({ db, shopId: shop.id }, id)).status).toBe('draft');
    expect(await db.select().from(mailOutbox).where(eq(mailOutbox.shopId, shop.id))).toEqual([]);

    const sent = await sendPurchaseOrder(db, shop.id, owner.id, id, 'orders@cedarrun.example');
    expect(sent.status).toBe('sent');
    expect(sent.sentAt).not.toBeNull();
    const [mail] = await db.select().from(mailOutbox).where(eq(mailOutbox.shopId, shop.id));
    expect(mail).toMatchObject({ kind: 'purchase-order', toAddress: 'orders@cedarrun.example', subject: `Purchase order PO-0001 from ${shop.name}` });
    expect(mail.textBody).toContain('PO-0001');
    expect(mail.attachments).toEqual([expect.objectContaining({ filename: 'PO-0001-Cedar-Run-Plywood.pdf', contentType: 'application/pdf' })]);
    expect(Buffer.from(mail.attachments[0].content, 'base64').subarray(0, 5).toString()).toBe('%PDF-');
    // Sent once only; the address is kept for the supplier's next order.
    await expect(sendPurchaseOrder(db, shop.id, owner.id, id)).rejects.toMatchObject({ kind: 'conflict' });
    const [again] = await createFromLowStock({ db, shopId: shop.id, userId: owner.id }).catch(() => [null]);
    expect(again).toBeNull(); // nothing more to order: the sheet is on this order
  });

  test('receiving part, then the rest: counts, movements naming the order, statuses, and the ledger still sums', async () => {
    const { shop, owner, sheet, id } = await draftFor();
    await updateDraft({ db, shopId: shop.id, userId: owner.id }, id, { supplierEmail: 'orders@cedarrun.example' });
    // A draft is not received against.
    await expect(
      receivePurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id, { lines: [], all: true, updateCosts: false }),
    ).rejects.toMatchObject({
      kind: 'conflict',
    });
    const sent = await sendPurchaseOrder(db, shop.id, owner.id, id);
    const line = sent.lines[0];
    expect(line.quantity).toBe(5); // 2 × 3 − 1
    const part = await receivePurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id, {
      lines: [{ lineId: line.id, quantity: 2 }],
      updateCosts: false,
    });
    expect(part.status).toBe('part-received');
    expect(part.lines[0].received).toBe(2);
    expect((await count(sheet.id)).onHand).toBe(3);
    // More than is still to come is refused, with the figures; nothing is written.
    await expect(
      receivePurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id, { lines: [{ lineId: line.id, quantity: 4 }], updateCosts: false }),
    ).rejects.toMatchObject({ kind: 'conflict', message: expect.stringContaining('5 ordered and 2 already received, so 3 more can come in, not 4') });
    expect((await count(sheet.id)).onHand).toBe(3);
    // A part-received order is not cancelled.
    await expect(cancelPurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id)).rejects.toMatchObject({ kind: 'conflict' });
    const done = await receivePurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id, { lines: [], all: true, updateCosts: false });
    expect(done.status).toBe('received');
    expect(done.receivedAt).not.toBeNull();
    expect((await count(sheet.id)).onHand).toBe(6);
    const moves = await db
      .select()
      .from(stockMovements)
      .where(and(eq(stockMovements.stockItemId, sheet.id), eq(stockMovements.purchaseOrderId, id)));
    expect(moves.map((m) => [m.kind, m.quantity, m.reason]).sort()).toEqual([
      ['received', 2, 'Received on PO-0001'],
      ['received', 3, 'Received on PO-0001'],
    ]);
    expect(await ledgerMismatches({ db, shopId: shop.id })).toEqual([]);
    await expect(
      receivePurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id, { lines: [], all: true, updateCosts: false }),
    ).rejects.toMatchObject({
      kind: 'conflict',
    });
  });

  test('all or nothing: a receipt with one line too many writes no line, count or movement', async () => {
    const { shop, owner, sheet, board, id } = await draftFor();
    await updateDraft({ db, shopId: shop.id, userId: owner.id }, id, {
      supplierEmail: 'o@cedarrun.example',
      lines: [
        { stockItemId: sheet.id, quantity: 5, unitCostCents: 8900 },
        { stockItemId: board.id, quantity: 2, unitCostCents: 925 },
      ],
    });
    const sent = await sendPurchaseOrder(db, shop.id, owner.id, id);
    const [l1, l2] = sent.lines;
    await expect(
      receivePurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id, {
        lines: [
          { lineId: l1.id, quantity: 5 },
          { lineId: l2.id, quantity: 3 },
        ],
        updateCosts: true,
      }),
    ).rejects.toMatchObject({ kind: 'conflict' });
    expect((await count(sheet.id)).onHand).toBe(1);
    expect((await db.select().from(purchaseOrderLines).where(eq(purchaseOrderLines.purchaseOrderId, id))).map((l) => l.received)).toEqual([0, 0]);
    expect(await db.select().from(stockMovements).where(eq(stockMovements.purchaseOrderId, id))).toEqual([]);
    expect((await getPurchaseOrder({ db, shopId: shop.id }, id)).status).toBe('sent');
  });

  test('“update the cost” takes the order’s price into the stock room, with the change in the audit log; without it the cost stays', async () => {
    const { shop, owner, sheet, id } = await draftFor({ costCents: 8900 });
    const draft = await updateDraft({ db, shopId: shop.id, userId: owner.id }, id, {
      supplierEmail: 'o@cedarrun.example',
      lines: [{ stockItemId: sheet.id, quantity: 4, unitCostCents: 9350 }],
    });
    await sendPurchaseOrder(db, shop.id, owner.id, id);
    await receivePurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id, {
      lines: [{ lineId: draft.lines[0].id, quantity: 1 }],
      updateCosts: false,
    });
    expect((await count(sheet.id)).costCents).toBe(8900);
    await receivePurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id, {
      lines: [{ lineId: draft.lines[0].id, quantity: 3 }],
      updateCosts: true,
    });
    expect((await count(sheet.id)).costCents).toBe(9350);
    const audit = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.shopId, shop.id), eq(auditEvents.entity, 'stock-item'), eq(auditEvents.entityId, sheet.id)));
    expect(audit.map((a) => a.data)).toEqual([expect.objectContaining({ changes: { costCents: { from: 8900, to: 9350 } }, purchaseOrderId: id })]);
  });

  test('a draft or a sent order is cancelled; it then leaves what is on order', async () => {
    const { shop, owner, sheet, id } = await draftFor();
    expect((await onOrderQuantities({ db, shopId: shop.id })).get(sheet.id)).toBe(5);
    const cancelled = await cancelPurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id);
    expect(cancelled.status).toBe('cancelled');
    expect((await onOrderQuantities({ db, shopId: shop.id })).get(sheet.id)).toBeUndefined();
    await expect(cancelPurchaseOrder({ db, shopId: shop.id, userId: owner.id }, id)).rejects.toMatchObject({ kind: 'conflict' });
  });

  test('through the routes: the estimator may not receive (stock:write); another shop’s owner gets 404; bad input is 422', async () => {
    const [po] = (
      await call(listRoute.POST, '/api/purchase-orders', '', fx.owner, { method: 'POST', body: { from: 'manual', supplier: 'Route Supply' } })
    ).body.orders;
    const item = await size(fx.mine.id, { supplier: 'Route Supply' });
    const patched = await call(orderRoute.PATCH, `/api/purchase-orders/${po.id}`, po.id, fx.estimator, {
      method: 'PATCH',
      body: { lines: [{ stockItemId: item.id, quantity: 0, unitCostCents: 100 }] },
    });
    expect(patched.status).toBe(422);
    expect(JSON.stringify(patched.body)).toContain('Order at least 1');
    expect((await call(orderRoute.GET, `/api/purchase-orders/${po.id}`, po.id, fx.otherOwner)).status).toBe(404);
    expect(
      (await call(receiveRoute.POST, `/api/purchase-orders/${po.id}/receive`, po.id, fx.estimator, { method: 'POST', body: { all: true } })).status,
    ).toBe(403);
  });
});

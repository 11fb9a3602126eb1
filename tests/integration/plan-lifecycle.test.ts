import { describe, expect, test } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type { Db } from '@/db/open';
import { offcuts, placements, planPieces, plans, stockItems, stockMovements } from '@/db/schema';
import { DomainError } from '@/lib/errors';
import { cancelPlan, finishPlan, releasePlan, StockShortage } from '@/db/queries/plan-lifecycle';
import { stockRef } from '@/db/queries/nest-request';
import { ledgerMismatches, listOffcuts, listStock } from '@/db/queries/stock';
import { optimize } from '@/lib/nesting';
import { isKeepableOffcut } from '@/lib/stock/offcut-rules';
import { nestRequestSchema, type NestRequestInput } from '@/shared/schemas/nesting';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request as httpRequest } from '../support/fixtures';
import { POST as releaseRoute } from '@/app/api/plans/[id]/release/route';
import { POST as doneRoute } from '@/app/api/plans/[id]/done/route';

let db: Db;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ db, fx } = app));

/** A draft plan nested by the real engine (no time budget: the same plan every run), stored as the Nest screen would. */
async function draftPlan(request: NestRequestInput, name = 'Test plan') {
  const parsed = nestRequestSchema.parse({
    ...request,
    settings: { minOffcutLength: 300, minOffcutWidth: 100, ...request.settings, timeBudgetMs: 0 },
  });
  const document = await optimize(parsed);
  const [row] = await db
    .insert(plans)
    .values({
      shopId: fx.mine.id,
      jobId: fx.myJob.id,
      name,
      status: 'draft',
      request: parsed,
      document,
      yieldRatio: document.totals?.yield ?? null,
      costCents: Math.round(document.totals?.cost ?? 0),
    })
    .returning();
  return { ...row, document };
}

async function sheet(values: Partial<typeof stockItems.$inferInsert> = {}) {
  const [item] = await db
    .insert(stockItems)
    .values({
      shopId: fx.mine.id,
      kind: 'sheet',
      material: 'Birch ply',
      nominalThickness: '18 mm',
      thickness: 18,
      length: 2440,
      width: 1220,
      onHand: 1,
      costCents: 6000,
      ...values,
    })
    .returning();
  // The opening count goes through the ledger like any receipt.
  if (item.onHand)
    await db
      .insert(stockMovements)
      .values({ shopId: fx.mine.id, kind: 'received', stockItemId: item.id, quantity: item.onHand, reason: 'Opening count' });
  return item;
}

const asStock = (item: typeof stockItems.$inferSelect) => ({
  id: stockRef.onHand(item.id),
  kind: item.kind,
  length: item.length,
  width: item.width,
  thickness: item.thickness,
  material: item.material,
  grain: item.grain,
  count: item.onHand - item.reserved,
  costEach: item.costCents,
});

const part = (id: string, length: number, width: number, quantity = 1, material = 'Birch ply', thickness = 18) => ({
  id,
  label: id,
  quantity,
  length,
  width,
  thickness,
  material,
  grain: 'any' as const,
});

async function expectLedgerMatchesCounts() {
  expect(await ledgerMismatches({ db, shopId: fx.mine.id })).toEqual([]);
}

const who = () => ({ shopId: fx.mine.id, userId: fx.owner.id });

describe('releasing plans that race for the same stock', () => {
  test('eight plans racing for the last sheet: exactly one reserves it, the rest are refused by name, counts stay exact', async () => {
    const last = await sheet({ material: 'Race ply', onHand: 3, reserved: 0 });
    // Two sheets already belong to someone else: one is free.
    await db.update(stockItems).set({ reserved: 2 }).where(eq(stockItems.id, last.id));
    await db
      .insert(stockMovements)
      .values({ shopId: fx.mine.id, kind: 'reserved', stockItemId: last.id, quantity: 0, reservedChange: 2, reason: 'Earlier plan' });
    const drafts = [];
    for (let i = 0; i < 8; i++)
      drafts.push(await draftPlan({ parts: [part(`race-${i}`, 2000, 1000, 1, 'Race ply')], stock: [{ ...asStock(last), count: 1 }] }, `Race ${i}`));

    const results = await Promise.allSettled(drafts.map((p) => releasePlan({ db, ...who() }, p.id)));
    const won = results.filter((r) => r.status === 'fulfilled');
    const refused = results.flatMap((r) => (r.status === 'rejected' ? [r.reason] : []));
    expect(won).toHaveLength(1);
    expect(refused).toHaveLength(7);
    for (const e of refused) {
      expect(e).toBeInstanceOf(StockShortage);
      expect(e.missing).toEqual([expect.objectContaining({ stockId: stockRef.onHand(last.id), material: 'Race ply', needed: 1, free: 0 })]);
    }
    const [after] = await db.select().from(stockItems).where(eq(stockItems.id, last.id));
    expect(after).toMatchObject({ onHand: 3, reserved: 3 });
    const statuses = (await db.select({ status: plans.status }).from(plans).where(eq(plans.jobId, fx.myJob.id))).filter(
      (p) => p.status === 'released',
    );
    expect(statuses).toHaveLength(1);
    await expectLedgerMatchesCounts();
  });

  test('six plans racing for the same offcut: one wins, the others are told it is gone', async () => {
    const [o] = await db
      .insert(offcuts)
      .values({ shopId: fx.mine.id, material: 'Offcut ply', thickness: 18, length: 800, width: 400, costCents: 500 })
      .returning();
    await db.insert(stockMovements).values({ shopId: fx.mine.id, kind: 'offcut-created', offcutId: o.id, quantity: 1, reason: 'Opening count' });
    const stock = [
      { id: stockRef.offcut(o.id), kind: 'offcut' as const, length: 800, width: 400, thickness: 18, material: 'Offcut ply', count: 1, costEach: 500 },
    ];
    const drafts = [];
    for (let i = 0; i < 6; i++) drafts.push(await draftPlan({ parts: [part(`oc-${i}`, 500, 300, 1, 'Offcut ply')], stock }));
    const results = await Promise.allSettled(drafts.map((p) => releasePlan({ db, ...who() }, p.id)));
    expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
    const refused = results.flatMap((r) => (r.status === 'rejected' ? [r.reason] : []));
    expect(refused.every((e) => e instanceof StockShortage && e.missing[0].kind === 'offcut')).toBe(true);
    const [after] = await db.select().from(offcuts).where(eq(offcuts.id, o.id));
    expect(after.status).toBe('reserved');
    await expectLedgerMatchesCounts();
  });

  test('the same plan released five times at once is released once; the others hear it is already released', async () => {
    const item = await sheet({ material: 'Twice ply', onHand: 4 });
    const plan = await draftPlan({ parts: [part('twice', 1000, 500, 2, 'Twice ply')], stock: [asStock(item)] });
    const results = await Promise.allSettled(Array.from({ length: 5 }, () => releasePlan({ db, ...who() }, plan.id)));
    expect(results.filter((r) => r.status === 'fulfilled')).toHaveLength(1);
    for (const r of results)
      if (r.status === 'rejected') expect(r.reason).toMatchObject({ kind: 'conflict', message: expect.stringMatching(/released/) });
    const [after] = await db.select().from(stockItems).where(eq(stockItems.id, item.id));
    expect(after.reserved).toBe(plan.document.pieces.length);
  });

  test('a plan whose pieces are partly gone reserves nothing at all', async () => {
    const a = await sheet({ material: 'Part ply A', onHand: 2 });
    const b = await sheet({ material: 'Part ply B', onHand: 2 });
    const plan = await draftPlan({
      parts: [part('pa', 2000, 1000, 1, 'Part ply A'), part('pb', 2000, 1000, 1, 'Part ply B')],
      stock: [asStock(a), asStock(b)],
    });
    await db.update(stockItems).set({ onHand: 0 }).where(eq(stockItems.id, b.id)); // counted and found none
    await db.insert(stockMovements).values({ shopId: fx.mine.id, kind: 'adjusted', stockItemId: b.id, quantity: -2, reason: 'Counted' });
    await expect(releasePlan({ db, ...who() }, plan.id)).rejects.toBeInstanceOf(StockShortage);
    const [afterA] = await db.select().from(stockItems).where(eq(stockItems.id, a.id));
    expect(afterA.reserved).toBe(0);
    const [p] = await db.select().from(plans).where(eq(plans.id, plan.id));
    expect(p.status).toBe('draft');
  });
});

describe('a plan from release to done', () => {
  test('done consumes the reserved sheets, puts the keepable offcuts on the rack where the cutter says, and records yield', async () => {
    const item = await sheet({ material: 'Done ply', onHand: 5, costCents: 8000 });
    const plan = await draftPlan({ parts: [part('side', 1800, 600, 3, 'Done ply')], stock: [asStock(item)] }, 'Done plan');
    const pieces = plan.document.pieces.length;
    expect(pieces).toBeGreaterThan(0);
    await releasePlan({ db, ...who() }, plan.id);
    expect((await db.select().from(stockItems).where(eq(stockItems.id, item.id)))[0]).toMatchObject({ onHand: 5, reserved: pieces });
    expect(await db.select().from(planPieces).where(eq(planPieces.planId, plan.id))).toHaveLength(pieces);

    const expected = plan.document.pieces
      .flatMap((p, pi) => (p.offcuts ?? []).map((r, i) => ({ pi, i, r })))
      .filter(({ r }) => isKeepableOffcut(r, { minLength: 300, minWidth: 100 }));
    expect(expected.length).toBeGreaterThan(0);
    const [firstPlaced] = plan.document.pieces[0].placements;
    const result = await finishPlan({ db, shopId: fx.mine.id, userId: fx.cutter.id }, plan.id, {
      offcuts: expected.map(({ pi, i }) => ({ piece: pi, index: i, keep: true, location: 'Bin 7' })),
      damaged: [{ piece: 0, partId: firstPlaced.partId, instance: firstPlaced.instance }],
    });

    expect((await db.select().from(stockItems).where(eq(stockItems.id, item.id)))[0]).toMatchObject({ onHand: 5 - pieces, reserved: 0 });
    const rack = (await listOffcuts({ db, shopId: fx.mine.id })).filter((o) => o.sourcePlanId === plan.id);
    expect(rack).toHaveLength(expected.length);
    expect(rack.every((o) => o.status === 'available' && o.location === 'Bin 7' && o.material === 'Done ply')).toBe(true);
    expect(rack.map((o) => o.length * o.width).sort()).toEqual(expected.map(({ r }) => r.w * r.h).sort());

    // One row per physical change: the reservation, then the cut that ends it (no separate release).
    const kinds = (await db.select().from(stockMovements).where(eq(stockMovements.planId, plan.id)))
      .map((m) => `${m.kind} ${m.quantity}/${m.reservedChange}`)
      .sort();
    expect(kinds).toEqual([`consumed -${pieces}/-${pieces}`, ...expected.map(() => 'offcut-created 1/0'), `reserved 0/${pieces}`].sort());

    const totals = plan.document.totals!;
    const damagedArea = firstPlaced.w * firstPlaced.h;
    expect(result.yieldRatio).toBeCloseTo((totals.partArea - damagedArea) / totals.stockArea, 9);
    const [saved] = await db.select().from(plans).where(eq(plans.id, plan.id));
    expect(saved).toMatchObject({ status: 'done', costCents: Math.round(totals.cost), finishedBy: fx.cutter.id });
    expect(saved.wasteRatio).toBeCloseTo(result.wasteRatio, 9);
    const damaged = await db
      .select()
      .from(placements)
      .innerJoin(planPieces, eq(planPieces.id, placements.planPieceId))
      .where(and(eq(planPieces.planId, plan.id), eq(placements.damaged, true)));
    expect(damaged).toHaveLength(1);
    await expectLedgerMatchesCounts();
  });

  test('a plan that bought sheets takes them from the rack once received, else records them received and cut', async () => {
    const item = await sheet({ material: 'Buy ply', onHand: 0, buyable: true });
    const request = { parts: [part('buy', 2000, 1000, 2, 'Buy ply')], stock: [{ ...asStock(item), id: stockRef.buy(item.id), count: null }] };
    const plan = await draftPlan(request);
    expect(plan.document.stockToBuy[0]?.count).toBe(2);
    const released = await releasePlan({ db, ...who() }, plan.id);
    expect(released.toBuy).toEqual([{ stockId: stockRef.buy(item.id), count: 2 }]);
    // One of the two arrives before the saw.
    await db.update(stockItems).set({ onHand: 1 }).where(eq(stockItems.id, item.id));
    await db.insert(stockMovements).values({ shopId: fx.mine.id, kind: 'received', stockItemId: item.id, quantity: 1, reason: 'Delivery' });
    await finishPlan({ db, shopId: fx.mine.id, userId: fx.cutter.id }, plan.id, { offcuts: [], damaged: [] });
    expect((await db.select().from(stockItems).where(eq(stockItems.id, item.id)))[0]).toMatchObject({ onHand: 0, reserved: 0 });
    await expectLedgerMatchesCounts();
  });

  test('cancel gives back every reservation: stock is as it was before release', async () => {
    const item = await sheet({ material: 'Cancel ply', onHand: 3 });
    const [o] = await db.insert(offcuts).values({ shopId: fx.mine.id, material: 'Cancel ply', thickness: 18, length: 900, width: 500 }).returning();
    await db.insert(stockMovements).values({ shopId: fx.mine.id, kind: 'offcut-created', offcutId: o.id, quantity: 1, reason: 'Opening count' });
    const plan = await draftPlan({
      parts: [part('c1', 2000, 1000, 2, 'Cancel ply'), part('c2', 800, 450, 1, 'Cancel ply')],
      stock: [asStock(item), { id: stockRef.offcut(o.id), kind: 'offcut', length: 900, width: 500, thickness: 18, material: 'Cancel ply', count: 1 }],
    });
    const before = await listStock({ db, shopId: fx.mine.id }, { material: 'Cancel ply' });
    await releasePlan({ db, ...who() }, plan.id);
    expect((await db.select().from(offcuts).where(eq(offcuts.id, o.id)))[0].status).toBe('reserved');
    await cancelPlan({ db, ...who() }, plan.id);
    expect(await listStock({ db, shopId: fx.mine.id }, { material: 'Cancel ply' })).toEqual(before);
    expect((await db.select().from(offcuts).where(eq(offcuts.id, o.id)))[0].status).toBe('available');
    await expect(finishPlan({ db, shopId: fx.mine.id, userId: fx.cutter.id }, plan.id, { offcuts: [], damaged: [] })).rejects.toMatchObject({
      kind: 'conflict',
    });
    await expectLedgerMatchesCounts();
  });

  test('done and cancel racing on one plan: exactly one happens, and the counts match it', async () => {
    const item = await sheet({ material: 'Both ply', onHand: 4 });
    const plan = await draftPlan({ parts: [part('both', 2000, 1000, 2, 'Both ply')], stock: [asStock(item)] });
    await releasePlan({ db, ...who() }, plan.id);
    const used = plan.document.pieces.length;
    const [done, cancelled] = await Promise.allSettled([
      finishPlan({ db, shopId: fx.mine.id, userId: fx.cutter.id }, plan.id, { offcuts: [], damaged: [] }),
      cancelPlan({ db, ...who() }, plan.id),
    ]);
    expect([done.status, cancelled.status].filter((s) => s === 'fulfilled')).toHaveLength(1);
    const [after] = await db.select().from(stockItems).where(eq(stockItems.id, item.id));
    expect(after).toEqual(expect.objectContaining(done.status === 'fulfilled' ? { onHand: 4 - used, reserved: 0 } : { onHand: 4, reserved: 0 }));
    await expectLedgerMatchesCounts();
  });

  test("another shop can neither release this shop's plan nor see its stock", async () => {
    const item = await sheet({ material: 'Private ply', onHand: 2 });
    const plan = await draftPlan({ parts: [part('p', 1000, 500, 1, 'Private ply')], stock: [asStock(item)] });
    await expect(releasePlan({ db, shopId: fx.theirs.id, userId: fx.otherOwner.id }, plan.id)).rejects.toSatisfy(
      (e) => e instanceof DomainError && e.kind === 'not-found',
    );
    expect(await listStock({ db, shopId: fx.theirs.id })).toEqual([]);
    expect(await listOffcuts({ db, shopId: fx.theirs.id })).toEqual([]);
  });
});

describe('the plan routes', () => {
  const call = async (route: typeof releaseRoute | typeof doneRoute, id: string, user: typeof fx.owner, body?: unknown) =>
    route(await httpRequest(`/api/plans/${id}/x`, { method: 'POST', user, body }), { params: Promise.resolve({ id }) });

  test('a refused release is a 409 naming each missing piece, with the way back to the Nest screen', async () => {
    const item = await sheet({ material: 'Gone ply', onHand: 1 });
    const plan = await draftPlan({ parts: [part('g', 2000, 1000, 1, 'Gone ply')], stock: [asStock(item)] });
    await db.update(stockItems).set({ reserved: 1 }).where(eq(stockItems.id, item.id));
    await db
      .insert(stockMovements)
      .values({ shopId: fx.mine.id, kind: 'reserved', stockItemId: item.id, quantity: 0, reservedChange: 1, reason: 'Elsewhere' });
    const res = await call(releaseRoute, plan.id, fx.estimator);
    expect(res.status).toBe(409);
    const body = await res.json();
    expect(body.missing).toEqual([expect.objectContaining({ material: 'Gone ply', needed: 1, free: 0 })]);
    expect(body.renest).toBe(`/jobs/${fx.myJob.id}/plan`);
  });

  test('a cutter finishing a plan cannot set its cost: the field is refused and the cost stays the plan’s own', async () => {
    const item = await sheet({ material: 'Cost ply', onHand: 2, costCents: 7000 });
    const plan = await draftPlan({ parts: [part('k', 1000, 500, 1, 'Cost ply')], stock: [asStock(item)] });
    await releasePlan({ db, ...who() }, plan.id);
    const refused = await call(doneRoute, plan.id, fx.cutter, { costCents: 1, offcuts: [], damaged: [] });
    expect(refused.status).toBe(422);
    const ok = await call(doneRoute, plan.id, fx.cutter, { offcuts: [], damaged: [] });
    expect(ok.status).toBe(200);
    const [saved] = await db.select().from(plans).where(eq(plans.id, plan.id));
    expect(saved.costCents).toBe(7000);
  });
});

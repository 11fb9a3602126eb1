import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { and, eq } from 'drizzle-orm';
import type { Db, DbHandle } from '@/db/open';
import { provideDatabase } from '@/db/client';
import { plans, stockItems } from '@/db/schema';
import {
  adjustStock,
  createStockItem,
  ledgerMismatches,
  listMovements,
  listOffcuts,
  listStock,
  receiveStock,
  recordOffcut,
  scrapOffcut,
  stockValue,
} from '@/db/queries/stock';
import { finishPlan } from '@/db/queries/plan-lifecycle';
import { listYieldLedger } from '@/db/queries/stock-yield';
import { seedDemoShop } from '@/seeds/demo-shop';
import { stockItemSchema } from '@/shared/schemas/stock';
import { readPlan } from '@/lib/nesting';
import { inches } from '@/lib/units/length';
import { createTestDatabase } from '../support/test-db';
import { request as httpRequest, TEST_SECRET, twoShops } from '../support/fixtures';
import { POST as importRoute } from '@/app/api/stock/import/route';
import { GET as stockRoute } from '@/app/api/stock/route';

process.env.NEXTAUTH_SECRET = TEST_SECRET;

let handle: DbHandle;
let db: Db;
let demoShop: string;
let fx: Awaited<ReturnType<typeof twoShops>>;
beforeAll(async () => {
  handle = await createTestDatabase();
  provideDatabase(handle);
  db = handle.db;
  demoShop = (await seedDemoShop(db)).shopId;
  fx = await twoShops(db);
});
afterAll(() => handle.close());

async function expectLedgerMatches(shopId: string) {
  expect(await ledgerMismatches({ db, shopId })).toEqual([]);
}

const newSheet = (over: Partial<Parameters<typeof stockItemSchema.parse>[0]> = {}) =>
  createStockItem(
    { db, shopId: fx.mine.id, userId: fx.owner.id },
    stockItemSchema.parse({
      kind: 'sheet',
      material: 'Test ply',
      nominalThickness: '18 mm',
      thickness: 18,
      length: 2440,
      width: 1220,
      onHand: 4,
      costCents: 5000,
      ...over,
    }),
  );

describe('the demo shop ledger', () => {
  test('sums to the counts after seeding and releasing the kitchen plan', async () => {
    await expectLedgerMatches(demoShop);
  });

  test('still sums after the cutter finishes the kitchen plan, whose offcuts land on the rack', async () => {
    const [plan] = await db
      .select()
      .from(plans)
      .where(and(eq(plans.shopId, demoShop), eq(plans.status, 'released')));
    const document = readPlan(plan.document);
    const result = await finishPlan({ db, shopId: demoShop, userId: plan.createdBy! }, plan.id, { offcuts: [], damaged: [] });
    expect(result.offcuts.length).toBe(document.pieces.reduce((n, p) => n + (p.offcuts?.length ?? 0), 0));
    expect((await listOffcuts({ db, shopId: demoShop })).filter((o) => o.sourcePlanId === plan.id)).toHaveLength(result.offcuts.length);
    await expectLedgerMatches(demoShop);
    const ledger = await listYieldLedger({ db, shopId: demoShop });
    // The ledger also holds the demo's past jobs; the kitchen plan is the one finished now, so the newest.
    expect(ledger.plans.filter((p) => p.id === plan.id)).toEqual([
      expect.objectContaining({ offcutsRacked: result.offcuts.length, yieldRatio: expect.closeTo(document.totals!.yield, 9) }),
    ]);
    expect(ledger.plans[0].id).toBe(plan.id);
    // Yield + kept offcuts + waste account for the whole stock area.
    const keptArea = result.offcuts.reduce((n, o) => n + o.length * o.width, 0);
    expect(result.yieldRatio + keptArea / document.totals!.stockArea + result.wasteRatio).toBeCloseTo(1, 9);
  });
});

describe('counts in the stock room', () => {
  test('a count changed behind the ledger’s back is reported as a mismatch', async () => {
    const item = await newSheet({ material: 'Sneaky ply', onHand: 3 });
    expect(await ledgerMismatches({ db, shopId: fx.mine.id })).toEqual([]);
    await db.update(stockItems).set({ onHand: 5 }).where(eq(stockItems.id, item.id));
    expect(await ledgerMismatches({ db, shopId: fx.mine.id })).toEqual([
      expect.objectContaining({ stored: { onHand: 5, reserved: 0 }, ledger: { onHand: 3, reserved: 0 } }),
    ]);
    await db.update(stockItems).set({ onHand: 3 }).where(eq(stockItems.id, item.id));
  });

  test('receiving adds to the count and books a receipt with who did it', async () => {
    const item = await newSheet();
    await receiveStock({ db, shopId: fx.mine.id, userId: fx.owner.id }, item.id, { quantity: 6, reason: 'Delivery 1182' });
    expect((await db.select().from(stockItems).where(eq(stockItems.id, item.id)))[0].onHand).toBe(10);
    const [latest] = await listMovements({ db, shopId: fx.mine.id }, { stockItemId: item.id });
    expect(latest).toMatchObject({ kind: 'received', quantity: 6, reason: 'Delivery 1182', who: 'Olu Birch' });
    await expectLedgerMatches(fx.mine.id);
  });

  test('an adjustment sets the counted figure and records the difference with its reason', async () => {
    const item = await newSheet({ onHand: 7 });
    await adjustStock({ db, shopId: fx.mine.id, userId: fx.owner.id }, item.id, { count: 5, reason: 'Counted: two water-damaged' });
    const [latest] = await listMovements({ db, shopId: fx.mine.id }, { stockItemId: item.id });
    expect(latest).toMatchObject({ kind: 'adjusted', quantity: -2, reason: 'Counted: two water-damaged' });
    await expectLedgerMatches(fx.mine.id);
  });

  test('a count below what released plans hold is refused, and the database refuses it too', async () => {
    const item = await newSheet({ onHand: 3 });
    await db.update(stockItems).set({ reserved: 2 }).where(eq(stockItems.id, item.id));
    await expect(adjustStock({ db, shopId: fx.mine.id, userId: fx.owner.id }, item.id, { count: 1, reason: 'Counted' })).rejects.toMatchObject({
      kind: 'conflict',
    });
    await expect(db.update(stockItems).set({ onHand: 1 }).where(eq(stockItems.id, item.id))).rejects.toThrow();
    await expect(db.update(stockItems).set({ onHand: -1, reserved: 0 }).where(eq(stockItems.id, item.id))).rejects.toThrow();
    await db.update(stockItems).set({ reserved: 0 }).where(eq(stockItems.id, item.id));
  });

  test('an offcut recorded at the saw can be scrapped once, and by no other shop', async () => {
    const o = await recordOffcut(
      { db, shopId: fx.mine.id, userId: fx.cutter.id },
      {
        material: 'Test ply',
        thickness: 18,
        length: 700,
        width: 300,
        grain: 'along-length',
        location: 'Bin 2',
      },
    );
    await scrapOffcut({ db, shopId: fx.mine.id, userId: fx.cutter.id }, o.id, 'Delaminated');
    await expect(scrapOffcut({ db, shopId: fx.mine.id, userId: fx.cutter.id }, o.id, 'again')).rejects.toMatchObject({ kind: 'conflict' });
    await expect(scrapOffcut({ db, shopId: fx.theirs.id, userId: fx.otherOwner.id }, o.id, 'not theirs')).rejects.toMatchObject({
      kind: 'not-found',
    });
    await expectLedgerMatches(fx.mine.id);
  });

  test('stock value counts sheets each and boards by the board foot (AHEC: 4/4 × 6″ × 8′ = 4 BF, at $9.25/bf = $37.00)', async () => {
    const { shopId } = { shopId: fx.theirs.id };
    await createStockItem(
      { db, shopId, userId: fx.otherOwner.id },
      stockItemSchema.parse({
        kind: 'board',
        material: 'White oak',
        nominalThickness: '4/4',
        thickness: inches(13 / 16),
        length: inches(96),
        width: inches(6),
        onHand: 10,
        costCents: 925,
      }),
    );
    await createStockItem(
      { db, shopId, userId: fx.otherOwner.id },
      stockItemSchema.parse({
        kind: 'sheet',
        material: 'Maple ply',
        nominalThickness: '3/4"',
        thickness: 18,
        length: inches(96),
        width: inches(48),
        onHand: 2,
        costCents: 9400,
      }),
    );
    expect((await stockValue({ db, shopId })).stockCents).toBe(10 * 3700 + 2 * 9400);
    expect((await listStock({ db, shopId: fx.mine.id })).some((i) => i.material === 'White oak')).toBe(false);
  });
});

describe('importing stock from CSV', () => {
  const csv =
    'kind,material,thickness,length,width,quantity,cost\nsheet,Import MDF,18 mm,2440 mm,1220 mm,3,46\nsheet,,18 mm,two metres,1220 mm,3,46\n';
  const post = async (commit: string) =>
    importRoute(await httpRequest('/api/stock/import', { method: 'POST', user: fx.owner, body: { csv, commit } }), { params: Promise.resolve({}) });

  test('lists every bad row and writes nothing when asked for all rows', async () => {
    const res = await post('all');
    expect(res.status).toBe(422);
    expect((await res.json()).fields.csv[0]).toMatch(/^Line 3: .*material: is empty.*length/);
    expect(await listStock({ db, shopId: fx.mine.id }, { material: 'Import MDF' })).toEqual([]);
  });

  test('writes only the valid rows when the user chooses them, each with its opening receipt', async () => {
    const res = await post('valid');
    expect(res.status).toBe(200);
    expect(await res.json()).toMatchObject({ imported: 1, valid: 1, errors: [{ line: 3 }] });
    const [item] = await listStock({ db, shopId: fx.mine.id }, { material: 'Import MDF' });
    expect(item).toMatchObject({ onHand: 3, costCents: 4600 });
    await expectLedgerMatches(fx.mine.id);
  });

  test('a cutter sees the rack without a single price', async () => {
    const res = await stockRoute(await httpRequest('/api/stock', { user: fx.cutter }), { params: Promise.resolve({}) });
    const body = await res.json();
    expect(body.items.length).toBeGreaterThan(0);
    expect(JSON.stringify(body)).not.toMatch(/cost|value/i);
  });
});

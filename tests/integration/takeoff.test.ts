import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { eq } from 'drizzle-orm';
import type { Db, DbHandle } from '@/db/open';
import { plans } from '@/db/schema';
import { listStock } from '@/db/queries/stock';
import { getTakeoff } from '@/db/queries/takeoff';
import { seedDemoShop } from '@/seeds/demo-shop';
import { createTestDatabase } from '../support/test-db';
import { twoShops } from '../support/fixtures';

let handle: DbHandle;
let db: Db;
let demoShop: string;
let fx: Awaited<ReturnType<typeof twoShops>>;
beforeAll(async () => {
  handle = await createTestDatabase();
  db = handle.db;
  demoShop = (await seedDemoShop(db)).shopId;
  fx = await twoShops(db);
});
afterAll(() => handle.close());

describe('the takeoff', () => {
  test("for the demo kitchen: sheets to pull, their cost, the shop's 15 % allowance once per material, and whether the rack covers it", async () => {
    const [kitchen] = await db.select().from(plans).where(eq(plans.shopId, demoShop));
    const takeoff = (await getTakeoff({ db, shopId: demoShop }, kitchen.jobId))!;
    expect(takeoff.allowancePercent).toBe(15);
    const lines = [...takeoff.pull, ...takeoff.buy];
    expect(lines.length).toBeGreaterThan(0);
    for (const line of lines) expect(line.costCents).toBe(line.costEachCents * line.count);
    // By hand: the allowance is 15 % of each material's cost, to the cent, and the total is the cost plus it.
    for (const a of takeoff.allowances) expect(a.allowanceCents).toBe(Math.round(a.costCents * 0.15));
    expect(takeoff.totals.costWithAllowanceCents).toBe(takeoff.totals.costCents + takeoff.allowances.reduce((n, a) => n + a.allowanceCents, 0));
    expect(takeoff.totals.costWithAllowanceCents).toBeLessThanOrEqual(Math.round(takeoff.totals.costCents * 1.15) + takeoff.allowances.length);
    expect(await getTakeoff({ db, shopId: fx.mine.id }, kitchen.jobId)).toBeNull();
  });

  test('each size’s free count is the stock room’s own (on hand − reserved); the plan’s own reservation counts toward cover', async () => {
    const [kitchen] = await db.select().from(plans).where(eq(plans.shopId, demoShop));
    const takeoff = (await getTakeoff({ db, shopId: demoShop }, kitchen.jobId))!;
    const rack = await listStock({ db, shopId: demoShop });
    const sheets = takeoff.pull.filter((l) => l.kind === 'sheet');
    expect(sheets.length).toBeGreaterThan(0);
    for (const line of sheets) {
      const item = rack.find((i) => `stock:${i.id}` === line.stockId)!;
      expect(line.free).toBe(item.onHand - item.reserved);
      // The demo's kitchen plan is released: it holds exactly the pieces it uses.
      expect(line.heldByPlan).toBe(line.count);
      expect(line.covered).toBe(true);
    }
  });
});

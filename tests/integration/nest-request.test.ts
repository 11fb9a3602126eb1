import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { jobs, stockItems } from '@/db/schema';
import { buildNestRequest, costEachCents, stockRef } from '@/db/queries/nest-request';
import { optimize, validatePlan } from '@/lib/nesting';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { seedDemoShop } from '@/seeds/demo-shop';
import { inches } from '@/lib/units/length';
import { createTestDatabase } from '../support/test-db';

let handle: DbHandle;
let shopId: string;
beforeAll(async () => {
  handle = await createTestDatabase();
  shopId = (await seedDemoShop(handle.db)).shopId;
});
afterAll(() => handle.close());

describe('a nesting request built from the database', () => {
  test("holds the job's parts and the rack's free stock, buyable sizes and offcuts, and nests to a valid plan", async () => {
    const [kitchen] = await handle.db.select().from(jobs).where(eq(jobs.name, 'Hollis kitchen'));
    const request = nestRequestSchema.parse(await buildNestRequest({ db: handle.db, shopId }, kitchen.id, { timeBudgetMs: 0 }));
    expect(request.parts.length).toBeGreaterThan(0);
    const sources = new Set(request.stock.map((s) => stockRef.parse(s.id)?.source));
    expect(sources).toEqual(new Set(['stock', 'buy', 'offcut']));
    const plan = await optimize(request);
    expect(validatePlan(request, plan)).toEqual([]);
  });

  test.each([
    // 4/4 × 6½″ × 8′ = 1 × 6.5 × 8 / 12 = 4.333 BF (AHEC "Measurement": BF = T × W × L(ft) / 12); at $9.25/bf → $40.08
    ['4/4', inches(6.5), 925, 4008],
    // 8/4 × 7″ × 10′ = 11.667 BF (AHEC "Measurement", derived); at $10.00/bf → $116.67
    ['8/4', inches(7), 1000, 11667],
  ])('a %s board %f mm wide at %i¢/bf costs %i¢ each', async (nominal, width, perBf, expected) => {
    const length = nominal === '8/4' ? inches(120) : inches(96);
    const [board] = await handle.db
      .insert(stockItems)
      .values({
        shopId,
        kind: 'board',
        material: 'Cherry',
        nominalThickness: nominal,
        thickness: inches(1),
        length,
        width,
        costCents: perBf,
      })
      .returning();
    expect(costEachCents(board)).toBe(expected);
  });
});

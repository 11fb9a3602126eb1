import { describe, expect, test } from 'vitest';
import { optimize } from '@/lib/nesting';
import { part, request, sheet } from '@/lib/nesting/test-support';
import { readBenchPlan } from '@/lib/layout-bench/read-bench-plan';

describe('reading a plan onto the bench', () => {
  test('a plan served without prices reads with the same placements, and zero where the prices were', async () => {
    const plan = await optimize(request([part('side', 720, 560, { quantity: 2 })], [sheet('ply', 2440, 1220, { count: 2 })]));
    const priceless = JSON.parse(JSON.stringify(plan, (k, v) => (['cost', 'costEach', 'costCents'].includes(k) ? undefined : v)));
    const read = readBenchPlan(priceless);
    expect(read.pieces.map((p) => p.placements)).toEqual(plan.pieces.map((p) => p.placements));
    expect(read.totals?.cost).toBe(0);
    expect(read.stockToPull.every((l) => l.cost === 0 && l.costEach === 0)).toBe(true);
  });

  test('a full plan reads as it is', async () => {
    const plan = await optimize(request([part('side', 720, 560)], [sheet('ply', 2440, 1220)]));
    expect(readBenchPlan(plan)).toEqual(plan);
  });
});

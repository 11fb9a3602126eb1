import { describe, expect, test } from 'vitest';
import { withoutPrices } from './without-prices';

describe('withoutPrices (PRODUCT.md: the cutter sees no prices)', () => {
  test('removes every money field at any depth and keeps everything else', () => {
    const plan = {
      pieces: [{ stockId: 'stock:1', figures: { yield: 0.8, cost: 94 }, placements: [{ partId: 'p', x: 0 }] }],
      totals: { cost: 94, pieces: 1 },
      stockToPull: [{ costEach: 94, cost: 94, count: 1 }],
    };
    const row = { id: 'a', material: 'Maple ply', costCents: 9400, valueCents: 188_000, onHand: 2 };
    expect(withoutPrices(plan)).toEqual({
      pieces: [{ stockId: 'stock:1', figures: { yield: 0.8 }, placements: [{ partId: 'p', x: 0 }] }],
      totals: { pieces: 1 },
      stockToPull: [{ count: 1 }],
    });
    expect(withoutPrices(row)).toEqual({ id: 'a', material: 'Maple ply', onHand: 2 });
    expect(JSON.stringify(withoutPrices([plan, row]))).not.toMatch(/cost|value/i);
  });
});

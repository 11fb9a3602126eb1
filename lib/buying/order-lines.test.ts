import { describe, expect, test } from 'vitest';
import { groupBySupplier, lowStockOrders, piecesToBuy, reorderQuantity, type BuyableSize } from './order-lines';

const size = (id: string, supplier: string, over: Partial<BuyableSize> = {}): BuyableSize => ({
  id,
  supplier,
  onHand: 10,
  reserved: 0,
  lowStockAt: 0,
  costCents: 5000,
  ...over,
});

describe('pieces a plan still needs bought (hand-worked figures)', () => {
  test('every piece of a size it buys; of a size it pulls, only what the rack is short of', () => {
    const wanted = piecesToBuy([
      // Bought outright: 3 pieces.
      { source: 'buy', stockItemId: 'a', count: 3, free: 0, heldByPlan: 0 },
      // Pulled: needs 7, 2 free, 1 already held by the plan → 7 − 2 − 1 = 4 short.
      { source: 'stock', stockItemId: 'b', count: 7, free: 2, heldByPlan: 1 },
      // Pulled and covered: 5 needed, 6 free → nothing to buy.
      { source: 'stock', stockItemId: 'c', count: 5, free: 6, heldByPlan: 0 },
      // Offcuts are never bought.
      { source: 'offcut', stockItemId: 'o', count: 1, free: 0, heldByPlan: 0 },
      // Over-reserved rack (free −2) counts as 0 free: 2 short, not 4.
      { source: 'stock', stockItemId: 'd', count: 2, free: -2, heldByPlan: 0 },
    ]);
    expect(Object.fromEntries(wanted)).toEqual({ a: 3, b: 4, d: 2 });
  });

  test('a size both pulled and bought is one line with both counts (2 short + 3 bought = 5)', () => {
    const wanted = piecesToBuy([
      { source: 'stock', stockItemId: 'a', count: 4, free: 2, heldByPlan: 0 },
      { source: 'buy', stockItemId: 'a', count: 3, free: 0, heldByPlan: 0 },
    ]);
    expect(wanted.get('a')).toBe(5);
  });
});

describe('reorder quantities: up to twice the low mark (min/max rule: common practice, no source)', () => {
  test('a size at its mark orders the mark again; below it, the gap to twice the mark', () => {
    // Mark 3, 3 free → 2 × 3 − 3 = 3.
    expect(reorderQuantity({ onHand: 3, reserved: 0, lowStockAt: 3 })).toBe(3);
    // Mark 6, 8 on hand with 5 reserved → 3 free → 12 − 3 = 9.
    expect(reorderQuantity({ onHand: 8, reserved: 5, lowStockAt: 6 })).toBe(9);
    // Mark 3, 2 free, 2 already on open orders → 6 − 2 − 2 = 2.
    expect(reorderQuantity({ onHand: 2, reserved: 0, lowStockAt: 3 }, 2)).toBe(2);
  });

  test('nothing for a size above its mark, unwatched (mark 0), or covered by open orders', () => {
    expect(reorderQuantity({ onHand: 4, reserved: 0, lowStockAt: 3 })).toBe(0);
    expect(reorderQuantity({ onHand: 0, reserved: 0, lowStockAt: 0 })).toBe(0);
    expect(reorderQuantity({ onHand: 1, reserved: 0, lowStockAt: 3 }, 5)).toBe(0);
  });
});

describe('one order per supplier', () => {
  test('lines group by supplier (case and spaces aside), suppliers in name order, each line at the size’s cost', () => {
    const sizes = [
      size('a', 'Millbrook Hardwoods', { costCents: 925 }),
      size('b', 'Cedar Run Plywood', { costCents: 8900 }),
      size('c', ' cedar run plywood ', { costCents: 6850 }),
      size('d', 'Cedar Run Plywood'),
    ];
    const orders = groupBySupplier(
      new Map([
        ['a', 2],
        ['b', 1],
        ['c', 4],
        ['d', 0],
      ]),
      sizes,
    );
    expect(orders).toEqual([
      {
        supplier: 'Cedar Run Plywood',
        lines: [
          { stockItemId: 'b', quantity: 1, unitCostCents: 8900 },
          { stockItemId: 'c', quantity: 4, unitCostCents: 6850 },
        ],
      },
      { supplier: 'Millbrook Hardwoods', lines: [{ stockItemId: 'a', quantity: 2, unitCostCents: 925 }] },
    ]);
  });

  test('low stock: only the sizes at or below their mark, less what is on order; a size with no supplier is its own order', () => {
    const sizes = [
      size('mdf', 'Hollow Creek Supply', { onHand: 2, lowStockAt: 3, costCents: 3400 }), // 6 − 2 = 4
      size('ply', 'Cedar Run Plywood', { onHand: 9, lowStockAt: 3 }), // not low
      size('oak', '', { onHand: 10, reserved: 2, lowStockAt: 10, costCents: 925 }), // 8 free → 20 − 8 = 12
    ];
    const orders = lowStockOrders(sizes, new Map([['oak', 5]])); // 12 − 5 = 7
    expect(orders).toEqual([
      { supplier: '', lines: [{ stockItemId: 'oak', quantity: 7, unitCostCents: 925 }] },
      { supplier: 'Hollow Creek Supply', lines: [{ stockItemId: 'mdf', quantity: 4, unitCostCents: 3400 }] },
    ]);
  });
});

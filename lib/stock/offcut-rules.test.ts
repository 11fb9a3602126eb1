import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inches } from '@/lib/units/length';
import { isKeepableOffcut, offcutCostCents, offcutSize } from './offcut-rules';
import { isLowStock } from './low-stock';

const MIN = { minLength: inches(12), minWidth: inches(4) };

describe('which offcuts go back on the rack', () => {
  test.each([
    ['common practice, no source: 30 × 16″ clears a 12 × 4″ minimum', { w: inches(30), h: inches(16) }, true],
    ['common practice, no source: measured either way round (4 × 12″)', { w: inches(4), h: inches(12) }, true],
    ['common practice, no source: a 3¾″ strip is too narrow', { w: inches(48), h: inches(3.75) }, false],
    ['common practice, no source: 11 × 11″ is too short', { w: inches(11), h: inches(11) }, false],
  ])('%s', (_label, rect, keep) => {
    expect(isKeepableOffcut(rect, MIN)).toBe(keep);
  });
});

describe("an offcut's share of its sheet's cost", () => {
  test('[derived] a quarter of a $94.00 sheet carries $23.50', () => {
    expect(offcutCostCents({ w: 1219.2, h: 609.6 }, { w: 2438.4, h: 1219.2 }, 9400)).toBe(2350);
  });

  test('is never more than the sheet and never negative', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 3000, noNaN: true }),
        fc.double({ min: 1, max: 3000, noNaN: true }),
        fc.integer({ min: 0, max: 1e6 }),
        (w, h, cost) => {
          const share = offcutCostCents({ w, h }, { w: 3000, h: 3000 }, cost);
          expect(share).toBeGreaterThanOrEqual(0);
          expect(share).toBeLessThanOrEqual(cost);
        },
      ),
    );
  });
});

describe('offcut size and low stock', () => {
  test('a grained offcut keeps its length along the grain; a grainless one is measured long side first', () => {
    expect(offcutSize({ w: 200, h: 600 }, 'along-length')).toEqual({ length: 200, width: 600 });
    expect(offcutSize({ w: 200, h: 600 }, 'none')).toEqual({ length: 600, width: 200 });
  });

  test.each([
    ['free 4 at a mark of 4 is low', { onHand: 6, reserved: 2, lowStockAt: 4 }, true],
    ['free 5 at a mark of 4 is not', { onHand: 5, reserved: 0, lowStockAt: 4 }, false],
    ['a mark of 0 is not watched', { onHand: 0, reserved: 0, lowStockAt: 0 }, false],
  ])('%s', (_label, item, low) => {
    expect(isLowStock(item)).toBe(low);
  });
});

import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { extent, highEdge, lowEdge, otherAxis, sameRect, slice } from '@/lib/geometry/axis';

const r = { x: 10, y: 20, w: 300, h: 100 };

describe('axis views of a rect', () => {
  test.each([
    ['x', 10, 310, 300],
    ['y', 20, 120, 100],
  ] as const)('along %s the rect runs from %d to %d (%d long)', (a, lo, hi, len) => {
    expect([lowEdge(r, a), highEdge(r, a), extent(r, a)]).toEqual([lo, hi, len]);
  });

  test('slicing keeps the other axis and never goes negative', () => {
    expect(slice(r, 'x', 50, 80)).toEqual({ x: 50, y: 20, w: 30, h: 100 });
    expect(slice(r, 'y', 60, 40)).toEqual({ x: 10, y: 60, w: 300, h: 0 });
    expect(otherAxis('x')).toBe('y');
  });

  test('a rect sliced at any point into two spans keeps its extent minus the gap', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('x' as const, 'y' as const),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        (a, f, gap) => {
          const cut = lowEdge(r, a) + f * extent(r, a);
          const low = slice(r, a, lowEdge(r, a), cut);
          const high = slice(r, a, Math.min(highEdge(r, a), cut + gap), highEdge(r, a));
          expect(extent(low, a) + extent(high, a) + Math.min(gap, highEdge(r, a) - cut)).toBeCloseTo(extent(r, a), 9);
          expect(extent(low, otherAxis(a))).toBe(extent(r, otherAxis(a)));
        },
      ),
    );
  });

  test('sameRect allows only the given tolerance', () => {
    expect(sameRect(r, { ...r, x: 10 + 1e-7 }, 1e-6)).toBe(true);
    expect(sameRect(r, { ...r, x: 10 + 1e-5 }, 1e-6)).toBe(false);
  });
});

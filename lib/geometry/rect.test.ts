import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { area, contains, overlaps, right, top, type Rect } from './rect';

// Checked against the definitions themselves on integer rectangles: two rectangles' interiors overlap exactly when
// some unit cell of the grid lies in both, and one contains the other exactly when every cell of the inner one lies
// in the outer one (common practice, no source: the cell test is how overlap is taught on graph paper).
const cells = (r: Rect) => {
  const out = new Set<string>();
  for (let x = r.x; x < r.x + r.w; x++) for (let y = r.y; y < r.y + r.h; y++) out.add(`${x},${y}`);
  return out;
};
const rect = fc.record({
  x: fc.integer({ min: 0, max: 12 }),
  y: fc.integer({ min: 0, max: 12 }),
  w: fc.integer({ min: 1, max: 8 }),
  h: fc.integer({ min: 1, max: 8 }),
});
const runs = { numRuns: 500, seed: 20261203 };

describe('rectangles', () => {
  test('edges and area of a 2440 × 1220 sheet placed at (10, 10)', () => {
    const sheet = { x: 10, y: 10, w: 2440, h: 1220 };
    expect(right(sheet)).toBe(2450);
    expect(top(sheet)).toBe(1230);
    expect(area(sheet)).toBe(2_976_800);
  });

  test('overlap means a shared cell: touching edges and corners do not overlap', () => {
    fc.assert(
      fc.property(rect, rect, (a, b) => {
        const shared = [...cells(a)].some((c) => cells(b).has(c));
        expect(overlaps(a, b)).toBe(shared);
        expect(overlaps(b, a)).toBe(shared);
      }),
      runs,
    );
    expect(overlaps({ x: 0, y: 0, w: 5, h: 5 }, { x: 5, y: 0, w: 5, h: 5 })).toBe(false);
    expect(overlaps({ x: 0, y: 0, w: 5, h: 5 }, { x: 5, y: 5, w: 1, h: 1 })).toBe(false);
  });

  test('containment means every cell of the inner one is in the outer one; a rectangle contains itself', () => {
    fc.assert(
      fc.property(rect, rect, (outer, inner) => {
        const all = [...cells(inner)].every((c) => cells(outer).has(c));
        expect(contains(outer, inner)).toBe(all);
        expect(contains(outer, outer)).toBe(true);
      }),
      runs,
    );
  });

  test('a sliver of a rounding error is not an overlap, and a hair outside is still inside', () => {
    const a = { x: 0, y: 0, w: 600.3, h: 300 };
    expect(overlaps(a, { x: 600.3 - 1e-12, y: 0, w: 100, h: 300 })).toBe(false);
    expect(contains({ x: 0, y: 0, w: 2440, h: 1220 }, { x: -1e-12, y: 0, w: 2440, h: 1220 })).toBe(true);
    expect(contains({ x: 0, y: 0, w: 2440, h: 1220 }, { x: 0, y: 0, w: 2440.001, h: 1220 })).toBe(false);
  });
});

import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { snapRect } from '@/lib/layout-bench/snap';
import { validatePlan } from '@/lib/nesting';
import { at, request, sheet, part } from '@/lib/nesting/test-support';

const usable = { x: 10, y: 10, w: 2420, h: 1200 };
const kerf = 3.2;

describe('snapping a dragged part', () => {
  test.each([
    // common practice, no source: the blade needs one kerf of clear space between two parts.
    [
      'a part dropped just right of a neighbour lands one kerf from it',
      { x: 607, y: 10, w: 400, h: 300 },
      [{ x: 10, y: 10, w: 594, h: 300 }],
      10 + 594 + kerf,
      10,
    ],
    [
      'a part dropped just left of a neighbour lands one kerf before it',
      { x: 200, y: 20, w: 400, h: 300 },
      [{ x: 610, y: 10, w: 300, h: 300 }],
      610 - kerf - 400,
      10,
    ],
    ['a part dropped near the trimmed edge lands on it', { x: 14, y: 1200 + 10 - 300 - 6, w: 400, h: 300 }, [], 10, 1210 - 300],
    [
      'a part dropped below a neighbour lands one kerf under it',
      { x: 12, y: 318, w: 400, h: 300 },
      [{ x: 10, y: 10, w: 400, h: 305 }],
      10,
      10 + 305 + kerf,
    ],
  ])('%s', (_label, moving, others, x, y) => {
    const s = snapRect(moving, usable, others, kerf, 20);
    expect(s.x).toBeCloseTo(x, 9);
    expect(s.y).toBeCloseTo(y, 9);
  });

  test('a part far from every edge and neighbour stays where it was dropped', () => {
    expect(snapRect({ x: 900, y: 500, w: 100, h: 100 }, usable, [{ x: 10, y: 10, w: 100, h: 100 }], kerf, 20)).toEqual({
      x: 900,
      y: 500,
      snappedX: null,
      snappedY: null,
    });
  });

  test('a neighbour on another row does not pull a part sideways', () => {
    const s = snapRect({ x: 606, y: 800, w: 100, h: 100 }, usable, [{ x: 10, y: 10, w: 594, h: 100 }], kerf, 20);
    expect(s.snappedX).toBeNull();
  });

  test('two parts snapped side by side pass validatePlan (the one judge) at exactly one kerf', () => {
    const req = request([part('a', 594, 300), part('b', 400, 300)], [sheet('s', 2440, 1220)], { kerf, trim: 10 });
    const s = snapRect({ x: 611, y: 12, w: 400, h: 300 }, usable, [{ x: 10, y: 10, w: 594, h: 300 }], kerf, 20);
    const plan = {
      version: 1 as const,
      unplaced: [],
      pieces: [
        {
          stockId: 's',
          kind: 'sheet' as const,
          length: 2440,
          width: 1220,
          thickness: 18,
          material: 'birch ply',
          trim: 10,
          placements: [at('a', 10, 10, 594, 300), at('b', s.x, s.y, 400, 300)],
        },
      ],
    };
    expect(validatePlan(req, plan)).toEqual([]);
  });

  test('snapping moves a part by at most the threshold on each axis', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -100, max: 2500, noNaN: true }),
        fc.double({ min: -100, max: 1300, noNaN: true }),
        fc.double({ min: 0, max: 50, noNaN: true }),
        (x, y, threshold) => {
          const s = snapRect({ x, y, w: 300, h: 200 }, usable, [{ x: 500, y: 400, w: 300, h: 300 }], kerf, threshold);
          expect(Math.abs(s.x - x)).toBeLessThanOrEqual(threshold + 1e-9);
          expect(Math.abs(s.y - y)).toBeLessThanOrEqual(threshold + 1e-9);
        },
      ),
    );
  });
});

test('a snap never pulls a part onto a neighbour when a clear spot is within reach', () => {
  // Nearest in line with B's top edge (10 mm away) would overlap A; one kerf below A (23.2 mm away) is clear.
  const a = { x: 10, y: 10, w: 594, h: 300 };
  const b = { x: 700, y: 280, w: 300, h: 300 };
  const s = snapRect({ x: 20, y: 290, w: 594, h: 300 }, usable, [a, b], kerf, 40);
  expect(s.x).toBe(10);
  expect(s.y).toBeCloseTo(10 + 300 + kerf, 9);
});

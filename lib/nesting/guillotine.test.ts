import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import type { Rect } from '@/lib/geometry/rect';
import { countStages, findGuillotineTree, treeLeaves } from '@/lib/nesting/guillotine';
import { checkTree } from '@/lib/nesting/cut-tree';

const board: Rect = { x: 0, y: 0, w: 1000, h: 500 };

/** The classic pinwheel: four rectangles around a centre square, no straight line crosses the square without cutting one. */
const pinwheel: Rect[] = [
  { x: 0, y: 0, w: 200, h: 100 },
  { x: 200, y: 0, w: 100, h: 200 },
  { x: 100, y: 200, w: 200, h: 100 },
  { x: 0, y: 100, w: 100, h: 200 },
  { x: 100, y: 100, w: 100, h: 100 },
];

/** Random guillotine layouts: cut a rect in two recursively (kerf between), keep some leaves as parts. */
const guillotineLayoutArb = (kerf: number) =>
  fc.infiniteStream(fc.tuple(fc.double({ min: 0.15, max: 0.85, noNaN: true }), fc.boolean(), fc.integer({ min: 0, max: 3 }))).map((stream) => {
    const it = stream[Symbol.iterator]();
    const rects: Rect[] = [];
    const grow = (r: Rect, depth: number) => {
      const [f, alongX, keep] = it.next().value!;
      const size = alongX ? r.w : r.h;
      if (depth >= 4 || size < 4 * kerf + 40) {
        if (keep > 0) rects.push(r);
        return;
      }
      const cut = Math.round(size * f);
      if (alongX) {
        grow({ ...r, w: cut }, depth + 1);
        grow({ ...r, x: r.x + cut + kerf, w: r.w - cut - kerf }, depth + 1);
      } else {
        grow({ ...r, h: cut }, depth + 1);
        grow({ ...r, y: r.y + cut + kerf, h: r.h - cut - kerf }, depth + 1);
      }
    };
    grow(board, 0);
    return rects;
  });

describe('findGuillotineTree', () => {
  test('separates two parts side by side with one crosscut and trims the rest off', () => {
    const parts = [
      { x: 0, y: 0, w: 400, h: 500 },
      { x: 403, y: 0, w: 400, h: 500 },
    ];
    const tree = findGuillotineTree(board, parts, 3);
    expect(tree).not.toBeNull();
    expect(checkTree(tree!, board, parts)).toEqual([]);
    expect(countStages(tree!)).toBe(1);
    const leftovers = treeLeaves(tree!).filter((l) => l.type === 'leftover');
    expect(leftovers.map((l) => l.rect)).toEqual([{ x: 806, y: 0, w: 194, h: 500 }]);
  });

  test('finds no tree for the classic five-rectangle pinwheel', () => {
    expect(findGuillotineTree({ x: 0, y: 0, w: 300, h: 300 }, pinwheel, 0)).toBeNull();
  });

  test('finds no tree for parts closer than one kerf, and one for parts exactly a kerf apart', () => {
    const close = [
      { x: 0, y: 0, w: 400, h: 500 },
      { x: 402, y: 0, w: 400, h: 500 },
    ];
    expect(findGuillotineTree(board, close, 3)).toBeNull();
    expect(findGuillotineTree(board, [close[0], { ...close[1], x: 403 }], 3)).not.toBeNull();
  });

  test('finds no tree for overlapping parts', () => {
    expect(
      findGuillotineTree(
        board,
        [
          { x: 0, y: 0, w: 400, h: 300 },
          { x: 300, y: 200, w: 400, h: 300 },
        ],
        0,
      ),
    ).toBeNull();
  });

  test('counts strip stages from the rips: a layout needing a fourth stage fails a 3-stage limit', () => {
    // Strip 1 (y 0–300) holds a crosscut piece with two parts stacked (3rd stage) and, inside the top one,
    // two parts side by side (a 4th stage).
    const parts = [
      { x: 0, y: 0, w: 300, h: 100 },
      { x: 0, y: 103, w: 140, h: 197 },
      { x: 143, y: 103, w: 157, h: 197 },
      { x: 303, y: 0, w: 200, h: 300 },
    ];
    const four = findGuillotineTree(board, parts, 3, Infinity, 'y');
    expect(four).not.toBeNull();
    expect(countStages(four!, 'y')).toBe(4);
    expect(findGuillotineTree(board, parts, 3, 3, 'y')).toBeNull();
    expect(findGuillotineTree(board, parts.slice(0, 1).concat(parts.slice(3)), 3, 3, 'y')).not.toBeNull();
  });

  test('shaves a sliver thinner than the kerf off the low edge with an empty first piece', () => {
    const parts = [{ x: 1, y: 0, w: 500, h: 500 }];
    const tree = findGuillotineTree(board, parts, 3);
    expect(tree).not.toBeNull();
    expect(checkTree(tree!, board, parts)).toEqual([]);
  });

  test('every random guillotine layout gets a well-formed tree with each part once', () => {
    const arb = fc.constantFrom(0, 3.2).chain((kerf) => guillotineLayoutArb(kerf).map((rects) => ({ kerf, rects })));
    fc.assert(
      fc.property(arb, ({ kerf, rects }) => {
        const tree = findGuillotineTree(board, rects, kerf);
        expect(tree).not.toBeNull();
        expect(checkTree(tree!, board, rects)).toEqual([]);
      }),
      { numRuns: 150 },
    );
  });

  test('a strips tree never needs more stages than the panel tree of the same random layout plus one', () => {
    const arb = guillotineLayoutArb(3.2);
    fc.assert(
      fc.property(arb, (rects) => {
        const panel = findGuillotineTree(board, rects, 3.2)!;
        const strips = findGuillotineTree(board, rects, 3.2, Infinity, 'y')!;
        expect(countStages(strips, 'y')).toBeLessThanOrEqual(countStages(panel) + 1);
      }),
      { numRuns: 100 },
    );
  });
});

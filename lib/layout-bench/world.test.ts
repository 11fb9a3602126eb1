import { describe, expect, test } from 'vitest';
import { layoutPieces, pieceAt, placementAt, placementsIn, PIECE_GAP } from '@/lib/layout-bench/world';
import type { BenchDoc } from '@/lib/layout-bench/document';

const piece = (length: number, width: number) => ({
  stockId: 's',
  kind: 'sheet' as const,
  length,
  width,
  thickness: 18,
  material: 'ply',
  trim: 0,
  grain: 'along-length' as const,
});
const place = (partId: string, piece: number, x: number, y: number, w: number, h: number) => ({
  partId,
  instance: 1,
  label: partId,
  piece,
  x,
  y,
  w,
  h,
  rotated: false,
  locked: false,
});

const doc: BenchDoc = {
  pieces: [piece(2440, 1220), piece(2440, 1220), piece(2440, 1220)],
  placements: { 'a#1': place('a', 0, 0, 0, 600, 400), 'b#1': place('b', 1, 100, 100, 500, 300), 'c#1': place('c', 2, 0, 0, 300, 300) },
  unplaced: [],
};

describe('the bench world and hit-testing on the geometry model', () => {
  const frames = layoutPieces(doc.pieces);

  test('pieces flow left to right and wrap into a new row', () => {
    expect(frames[1].x).toBe(2440 + PIECE_GAP);
    expect(frames[1].y).toBe(frames[0].y);
    expect(frames[2].x).toBe(0);
    expect(frames[2].y).toBeGreaterThan(frames[0].y + 1220);
  });

  test.each([
    ['a point on part a', 50, 50, 'a#1'],
    ['a point on part b on the second piece', 2440 + PIECE_GAP + 300, 300, 'b#1'],
    ['a point on bare stock', 1000, 1000, null],
    ['a point in the gap between pieces', 2440 + 10, 300, null],
  ])('%s hits %s', (_l, wx, wy, key) => {
    expect(placementAt(doc, frames, wx, wy + frames[0].y)).toBe(key);
  });

  test('the piece under a point is found, and none in the gap', () => {
    expect(pieceAt(frames, frames[2].x + 5, frames[2].y + 5)?.piece).toBe(2);
    expect(pieceAt(frames, 2440 + 10, frames[0].y + 5)).toBeNull();
  });

  test('a box selects the parts it meets, on any piece', () => {
    expect(placementsIn(doc, frames, { x: 0, y: 0, w: 2440 + PIECE_GAP + 200, h: frames[0].y + 200 }).sort()).toEqual(['a#1', 'b#1']);
  });
});

describe('part colours', () => {
  test('parts of one drawer schedule share a tone, and a tone does not change between visits', async () => {
    const { partTone, PART_TONES } = await import('@/lib/layout-bench/colors');
    expect(partTone('schedule-1', 'Maple ply')).toBe(partTone('schedule-1', 'Baltic birch'));
    expect(partTone(undefined, ' maple PLY ')).toBe(partTone(undefined, 'Maple ply'));
    expect(PART_TONES).toContain(partTone('x', 'y'));
  });
});

describe('fitting the view', () => {
  test('every piece lands inside the box, and a point maps to the screen through the view', async () => {
    const { fitView, toScreen, layoutPieces } = await import('@/lib/layout-bench/world');
    const frames = layoutPieces(doc.pieces);
    const view = fitView(frames, 900, 560);
    for (const f of frames) {
      const far = toScreen(view, f, f.w, f.h);
      expect(far.x).toBeLessThanOrEqual(900);
      expect(far.y).toBeLessThanOrEqual(560);
    }
    // The first piece's caption (drawn above it) stays on screen.
    expect(toScreen(view, frames[0], 0, 0).x).toBe(12);
    expect(toScreen(view, frames[0], 0, 0).y).toBeCloseTo(12 + 22, 9);
  });
});

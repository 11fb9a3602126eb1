/**
 * Where each stock piece sits on the bench's world (mm): pieces flow left to right in rows, like sheets leaned
 * on a rack, so every Sheet map and Board map is on screen at once. Hit-testing works on these rectangles.
 */
import type { Rect } from '@/lib/geometry/rect';
import type { BenchDoc, BenchPiece, BenchPlacement } from '@/lib/layout-bench/document';

/** Space between pieces on the bench, in mm of world. */
export const PIECE_GAP = 250;
/** Room above each piece for its caption, in mm of world; and on screen above the first row. */
export const CAPTION_SPACE = 180;
export const CAPTION_PX = 22;

export interface PieceFrame extends Rect {
  piece: number;
}

/** World frames of the pieces: rows no wider than `rowWidth` (at least the widest piece). */
export function layoutPieces(pieces: readonly Pick<BenchPiece, 'length' | 'width'>[], rowWidth = 2 * 2440 + PIECE_GAP): PieceFrame[] {
  const limit = Math.max(rowWidth, ...pieces.map((p) => p.length));
  const frames: PieceFrame[] = [];
  let x = 0;
  let y = CAPTION_SPACE;
  let rowHeight = 0;
  pieces.forEach((p, piece) => {
    if (x > 0 && x + p.length > limit) {
      x = 0;
      y += rowHeight + PIECE_GAP + CAPTION_SPACE;
      rowHeight = 0;
    }
    frames.push({ piece, x, y, w: p.length, h: p.width });
    x += p.length + PIECE_GAP;
    rowHeight = Math.max(rowHeight, p.width);
  });
  return frames;
}

const inside = (r: Rect, px: number, py: number) => px >= r.x && px <= r.x + r.w && py >= r.y && py <= r.y + r.h;

/** The piece under a world point, or null. */
export function pieceAt(frames: readonly PieceFrame[], px: number, py: number): PieceFrame | null {
  return frames.find((f) => inside(f, px, py)) ?? null;
}

/** The placement under a world point (its key), or null: the geometry model, never the drawn nodes. */
export function placementAt(doc: BenchDoc, frames: readonly PieceFrame[], px: number, py: number): string | null {
  const frame = pieceAt(frames, px, py);
  if (!frame) return null;
  const lx = px - frame.x;
  const ly = py - frame.y;
  let hit: string | null = null;
  for (const [key, p] of Object.entries(doc.placements)) if (p.piece === frame.piece && inside(p, lx, ly)) hit = key;
  return hit;
}

/** Keys of the placements whose world rectangles meet `box` (a rubber-band selection). */
export function placementsIn(doc: BenchDoc, frames: readonly PieceFrame[], box: Rect): string[] {
  const keys: string[] = [];
  for (const [key, p] of Object.entries(doc.placements)) {
    const f = frames[p.piece];
    if (!f) continue;
    const wx = f.x + p.x;
    const wy = f.y + p.y;
    if (wx < box.x + box.w && box.x < wx + p.w && wy < box.y + box.h && box.y < wy + p.h) keys.push(key);
  }
  return keys;
}

/** A placement's world rectangle. */
export function worldRect(p: BenchPlacement, frames: readonly PieceFrame[]): Rect {
  const f = frames[p.piece];
  return { x: f.x + p.x, y: f.y + p.y, w: p.w, h: p.h };
}

/** Screen px per world mm and the world origin's place on screen. */
export interface View {
  x: number;
  y: number;
  scale: number;
}

/** The view that shows every piece in a `width` × `height` px box, `margin` px from its top-left corner. */
export function fitView(frames: readonly PieceFrame[], width: number, height: number, margin = 12): View {
  const w = Math.max(1, ...frames.map((f) => f.x + f.w)) + PIECE_GAP;
  const h = Math.max(1, ...frames.map((f) => f.y + f.h)) + PIECE_GAP;
  // The first row's captions sit above the pieces: keep room for them on screen at any zoom.
  const top = margin + CAPTION_PX;
  return {
    x: margin,
    y: top - CAPTION_SPACE * Math.min((width - margin) / w, (height - top) / h),
    scale: Math.min((width - margin) / w, (height - top) / h),
  };
}

/** Screen position of a point given in a piece's own coordinates. */
export const toScreen = (view: View, frame: Rect, x: number, y: number) => ({
  x: view.x + (frame.x + x) * view.scale,
  y: view.y + (frame.y + y) * view.scale,
});

/**
 * Snapping a dragged part on the geometry model: to the usable edges of its stock piece, and to its neighbours at
 * exactly one kerf (so the blade fits between them), or in line with a neighbour's edge (so one through-cut frees
 * both). Each axis snaps on its own to the nearest candidate within `threshold`.
 */
import type { Rect } from '@/lib/geometry/rect';

export interface SnapResult {
  x: number;
  y: number;
  /** Which candidate won on each axis, if any (drawn as a guide). */
  snappedX: number | null;
  snappedY: number | null;
}

function nearest(value: number, candidates: number[], threshold: number): number | null {
  let best: number | null = null;
  for (const c of candidates) if (Math.abs(c - value) <= threshold && (best === null || Math.abs(c - value) < Math.abs(best - value))) best = c;
  return best;
}

/** Candidate positions of a moving span [pos, pos + size] against a neighbour's span [lo, hi] with `kerf` between. */
const beside = (lo: number, hi: number, size: number, kerf: number) => [hi + kerf, lo - kerf - size, lo, hi - size];

/**
 * Where `moving` (its proposed x, y and its size) lands when snapped within `usable` among `others` (placements on
 * the same piece, the moving one excluded). Only neighbours that face it across the other axis pull it.
 */
export function snapRect(moving: Rect, usable: Rect, others: readonly Rect[], kerf: number, threshold: number): SnapResult {
  const xs = [usable.x, usable.x + usable.w - moving.w];
  const ys = [usable.y, usable.y + usable.h - moving.h];
  const reach = threshold + kerf;
  for (const o of others) {
    // A neighbour pulls along x when the two share some extent along y (within reach), and the other way round.
    if (o.y < moving.y + moving.h + reach && moving.y < o.y + o.h + reach) xs.push(...beside(o.x, o.x + o.w, moving.w, kerf));
    if (o.x < moving.x + moving.w + reach && moving.x < o.x + o.w + reach) ys.push(...beside(o.y, o.y + o.h, moving.h, kerf));
  }
  const sx = nearest(moving.x, xs, threshold);
  const sy = nearest(moving.y, ys, threshold);
  return { x: sx ?? moving.x, y: sy ?? moving.y, snappedX: sx, snappedY: sy };
}

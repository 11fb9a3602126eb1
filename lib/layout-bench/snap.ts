/**
 * Snapping a dragged part on the geometry model: to the usable edges of its stock piece, and to its neighbours at
 * exactly one kerf (so the blade fits between them), or in line with a neighbour's edge (so one through-cut frees
 * both). Candidates within `threshold` on each axis are paired; the pair that keeps the part clear of its
 * neighbours wins, then the one snapped on more axes, then the nearest.
 */
import type { Rect } from '@/lib/geometry/rect';

export interface SnapResult {
  x: number;
  y: number;
  /** Which candidate won on each axis, if any (drawn as a guide). */
  snappedX: number | null;
  snappedY: number | null;
}

const within = (value: number, candidates: number[], threshold: number) => candidates.filter((c) => Math.abs(c - value) <= threshold);

/** Lexicographic order of ranking keys. */
function before(a: number[], b: number[]): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i] < b[i];
  return false;
}

/** True when `r` keeps at least one kerf of clear space from every rect in `others` (as `validatePlan` asks). */
function clear(r: Rect, others: readonly Rect[], kerf: number): boolean {
  const eps = 1e-6;
  return others.every((o) => Math.max(o.x - (r.x + r.w), r.x - (o.x + o.w), o.y - (r.y + r.h), r.y - (o.y + o.h)) >= kerf - eps);
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
  // Try every pair of candidates (and the spot as dropped): one clear of the neighbours beats one that is not,
  // a snapped axis beats a free one, and then the nearer wins. So a snap never pulls a part onto a neighbour.
  const cx: (number | null)[] = [null, ...within(moving.x, xs, threshold)];
  const cy: (number | null)[] = [null, ...within(moving.y, ys, threshold)];
  let best: { sx: number | null; sy: number | null; key: number[] } | null = null;
  for (const sx of cx) {
    for (const sy of cy) {
      const r = { x: sx ?? moving.x, y: sy ?? moving.y, w: moving.w, h: moving.h };
      const key = [
        clear(r, others, kerf) ? 0 : 1,
        (sx === null ? 1 : 0) + (sy === null ? 1 : 0),
        Math.abs(r.x - moving.x) + Math.abs(r.y - moving.y),
      ];
      if (!best || before(key, best.key)) best = { sx, sy, key };
    }
  }
  const { sx, sy } = best!;
  return { x: sx ?? moving.x, y: sy ?? moving.y, snappedX: sx, snappedY: sy };
}

/** Axis-wise views of a Rect: the same code cuts along x or along y. */
import type { Rect } from '@/lib/geometry/rect';

/** `x`: along the stock's length; `y`: along its width. */
export type Axis = 'x' | 'y';

export const otherAxis = (a: Axis): Axis => (a === 'x' ? 'y' : 'x');
export const lowEdge = (r: Rect, a: Axis) => (a === 'x' ? r.x : r.y);
export const highEdge = (r: Rect, a: Axis) => (a === 'x' ? r.x + r.w : r.y + r.h);
export const extent = (r: Rect, a: Axis) => (a === 'x' ? r.w : r.h);

/** `r` cut down to [from, to] along `a` (an empty span gives zero size, never negative). */
export const slice = (r: Rect, a: Axis, from: number, to: number): Rect =>
  a === 'x' ? { x: from, y: r.y, w: Math.max(0, to - from), h: r.h } : { x: r.x, y: from, w: r.w, h: Math.max(0, to - from) };

/** Same position and size within `eps`. */
export const sameRect = (a: Rect, b: Rect, eps = 1e-9) =>
  Math.abs(a.x - b.x) <= eps && Math.abs(a.y - b.y) <= eps && Math.abs(a.w - b.w) <= eps && Math.abs(a.h - b.h) <= eps;

/** Axis-aligned rectangle: x along the stock's length, y along its width; all in mm. */
export interface Rect {
  x: number;
  y: number;
  w: number;
  h: number;
}

export const right = (r: Rect) => r.x + r.w;
export const top = (r: Rect) => r.y + r.h;
export const area = (r: Rect) => r.w * r.h;

/** True when the interiors overlap (touching edges do not count). */
export function overlaps(a: Rect, b: Rect, eps = 1e-9): boolean {
  return a.x < right(b) - eps && b.x < right(a) - eps && a.y < top(b) - eps && b.y < top(a) - eps;
}

/** True when `inner` lies inside `outer` (edges may touch). */
export function contains(outer: Rect, inner: Rect, eps = 1e-9): boolean {
  return inner.x >= outer.x - eps && inner.y >= outer.y - eps && right(inner) <= right(outer) + eps && top(inner) <= top(outer) + eps;
}

/**
 * Where each saw-order step happens on its stock piece: the piece being cut, the blade's path (the kerf band and
 * its centre line), the edge riding the fence and the fence dimension. The saw-order pages, the shop floor and the
 * PDF draw their diagrams from this one model, so a picture can never disagree with the plan's numbers.
 */
import { extent, highEdge, lowEdge, otherAxis, slice, type Axis } from '@/lib/geometry/axis';
import type { Rect } from '@/lib/geometry/rect';
import { stockPieceName } from '@/lib/nesting/saw-order';
import type { PlanPiece, SawPiece, SawStep } from '@/shared/schemas/nesting';

export interface Segment {
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

export interface StepGeometry {
  step: SawStep;
  axis: Axis;
  /** The piece as it is just before this cut, in stock coordinates (mm). */
  piece: Rect;
  /** The wood the blade removes (one kerf wide, clipped to the piece). */
  kerf: Rect;
  /** The middle of the blade's path, running the full length of the piece (every cut is a through-cut). */
  line: Segment;
  /** The edge of the piece that rides the fence. */
  fenceEdge: Segment;
  /** From the fence edge to the blade's near side: its length is the fence setting. */
  fenceDimension: Segment;
  /** Every piece lying loose just before this cut (parts already freed included), by name. */
  before: { name: string; rect: Rect }[];
  produces: SawPiece[];
}

export const stepAxis = (kind: SawStep['kind']): Axis => (kind === 'rip' ? 'y' : 'x');

/** A segment across `r` at `at` along axis `a` (a line x = const for `x`, y = const for `y`). */
function across(r: Rect, a: Axis, at: number): Segment {
  return a === 'x' ? { x1: at, y1: r.y, x2: at, y2: r.y + r.h } : { x1: r.x, y1: at, x2: r.x + r.w, y2: at };
}

/** A segment along axis `a` from `from` to `to`, through the middle of `r`'s other extent. */
function along(r: Rect, a: Axis, from: number, to: number): Segment {
  const mid = lowEdge(r, otherAxis(a)) + extent(r, otherAxis(a)) / 2;
  return a === 'x' ? { x1: from, y1: mid, x2: to, y2: mid } : { x1: mid, y1: from, x2: mid, y2: to };
}

/**
 * Walks a piece's saw order from the whole stock piece and returns every step's geometry, in order. The piece named
 * by a step that does not exist (a saw order that does not replay) throws: `validatePlan` refuses such plans.
 */
export function sawOrderGeometry(piece: PlanPiece, pieceIndex: number, kerf: number): StepGeometry[] {
  const loose = new Map<string, Rect>([[stockPieceName(pieceIndex), { x: 0, y: 0, w: piece.length, h: piece.width }]]);
  return (piece.sawOrder ?? []).map((step) => {
    const cur = loose.get(step.piece);
    if (!cur) throw new Error(`Step ${step.n} cuts piece "${step.piece}", which is not there at that point.`);
    const axis = stepAxis(step.kind);
    const a0 = lowEdge(cur, axis);
    const a1 = highEdge(cur, axis);
    // The fence holds the reference edge; the blade's near side sits `fence` away from it.
    const bladeNear = step.reference === 'low' ? a0 + step.fence : a1 - step.fence;
    const pos = step.reference === 'low' ? bladeNear : bladeNear - kerf;
    const cutFrom = Math.max(a0, pos);
    const cutTo = Math.min(a1, pos + kerf);
    const fenceAt = step.reference === 'low' ? a0 : a1;
    const geometry: StepGeometry = {
      step,
      axis,
      piece: cur,
      kerf: slice(cur, axis, cutFrom, Math.max(cutFrom, cutTo)),
      line: across(cur, axis, (cutFrom + cutTo) / 2),
      fenceEdge: across(cur, axis, fenceAt),
      fenceDimension: along(cur, axis, fenceAt, bladeNear),
      before: [...loose].map(([name, rect]) => ({ name, rect })),
      produces: step.produces,
    };
    loose.delete(step.piece);
    for (const p of step.produces) loose.set(p.name, { x: p.x, y: p.y, w: p.w, h: p.h });
    return geometry;
  });
}

export const segmentLength = (s: Segment) => Math.hypot(s.x2 - s.x1, s.y2 - s.y1);

/**
 * Guillotine checks on bare layouts: can straight through-cuts separate these rectangles, and in how many stages?
 * Used by `validatePlan`, `rebuildCuts` (layout bench edits) and the benchmarks (other packers' layouts).
 */
import type { Rect } from '@/lib/geometry/rect';
import { highEdge as hi, lowEdge as lo, otherAxis as other, sameRect, slice, type Axis } from '@/lib/geometry/axis';
import type { CutNode } from '@/lib/nesting/pack/types';

export type { Axis };

/** Stages allowed by the `strips` cutting style: rips, crosscuts, trim rips. */
export const STRIP_STAGES = 3;

/** Tolerance for comparing positions in mm (float sums such as 600 + 3.2). */
export const EPS = 1e-6;

export interface GuillotineItem extends Rect {
  /** Id written into the tree's item leaves; defaults to the rectangle's index in the input. */
  itemId?: number;
  rotated?: boolean;
}

interface Item extends Rect {
  itemId: number;
  rotated: boolean;
}

interface Segment {
  from: number;
  to: number;
  items: Item[];
}

/**
 * Splits `region` along `axis` at every gap of at least one kerf between the items' projections.
 * Returns the pieces (low to high) and the cut positions between them, or null when no cut is possible.
 * A cut at `pos` removes [pos, pos + kerf]. Waste wider than two kerfs between groups gets its own piece; a narrower
 * gap leaves a sliver on the lower piece, trimmed at a later stage. A sliver thinner than the kerf at the region's
 * low edge is shaved by a cut with pos < the region's low edge, whose first child is an empty (zero-size) leftover.
 */
function split(region: Rect, items: Item[], axis: Axis, kerf: number): { pieces: Segment[]; cuts: number[] } | null {
  const sorted = [...items].sort((a, b) => lo(a, axis) - lo(b, axis));
  const clusters: Segment[] = [];
  for (const it of sorted) {
    const last = clusters[clusters.length - 1];
    if (last && lo(it, axis) < last.to + kerf - EPS) {
      last.to = Math.max(last.to, hi(it, axis));
      last.items.push(it);
    } else clusters.push({ from: lo(it, axis), to: hi(it, axis), items: [it] });
  }
  const r0 = lo(region, axis);
  const r1 = hi(region, axis);
  const pieces: Segment[] = [];
  const cuts: number[] = [];
  let cursor = r0;
  const first = clusters[0];
  if (first.from > r0 + EPS) {
    pieces.push({ from: r0, to: Math.max(r0, first.from - kerf), items: [] });
    cuts.push(first.from - kerf);
    cursor = first.from;
  }
  for (let i = 0; i < clusters.length - 1; i++) {
    const cur = clusters[i];
    const next = clusters[i + 1];
    if (next.from - cur.to > 2 * kerf + EPS) {
      pieces.push({ from: cursor, to: cur.to, items: cur.items });
      cuts.push(cur.to);
      pieces.push({ from: cur.to + kerf, to: next.from - kerf, items: [] });
    } else {
      pieces.push({ from: cursor, to: next.from - kerf, items: cur.items });
    }
    cuts.push(next.from - kerf);
    cursor = next.from;
  }
  const last = clusters[clusters.length - 1];
  if (r1 - last.to > EPS) {
    pieces.push({ from: cursor, to: last.to, items: last.items });
    cuts.push(last.to);
    if (r1 - (last.to + kerf) > EPS) pieces.push({ from: last.to + kerf, to: r1, items: [] });
  } else pieces.push({ from: cursor, to: r1, items: last.items });
  return cuts.length === 0 ? null : { pieces, cuts };
}

interface Level {
  axis: Axis;
  stage: number;
}

function build(region: Rect, items: Item[], level: Level, parent: Level | null, skipped: boolean, kerf: number, maxStages: number): CutNode | null {
  if (items.length === 0) return { type: 'leftover', rect: region };
  if (items.length === 1 && sameRect(items[0], region, EPS)) {
    return { type: 'item', rect: region, itemId: items[0].itemId, rotated: items[0].rotated };
  }
  const parts = split(region, items, level.axis, kerf);
  if (!parts) {
    if (skipped) return null; // neither direction has a through-cut: not guillotine (or overlapping)
    // Nothing to cut this way: the next cuts run the other way, merging with the parent's stage when it ran that way.
    const next = parent && parent.axis === other(level.axis) ? parent : { axis: other(level.axis), stage: level.stage + 1 };
    return build(region, items, next, parent, true, kerf, maxStages);
  }
  if (level.stage > maxStages) return null;
  const { pieces, cuts } = parts;
  const r1 = hi(region, level.axis);
  const childLevel: Level = { axis: other(level.axis), stage: level.stage + 1 };
  const children: CutNode[] = [];
  for (const p of pieces) {
    const rect = slice(region, level.axis, p.from, p.to);
    const node = p.items.length === 0 ? ({ type: 'leftover', rect } as CutNode) : build(rect, p.items, childLevel, level, false, kerf, maxStages);
    if (!node) return null;
    children.push(node);
  }
  // A chain of binary cuts, low side first: cut i separates piece i from everything above it.
  let tail: CutNode | undefined = cuts.length < pieces.length ? children[children.length - 1] : undefined;
  for (let i = cuts.length - 1; i >= 0; i--) {
    const rect = slice(region, level.axis, pieces[i].from, r1);
    tail = {
      type: 'cut',
      rect,
      axis: level.axis,
      pos: cuts[i],
      kerf,
      children: tail ? [children[i], tail] : [children[i]],
    };
  }
  return tail!;
}

/**
 * Finds a guillotine cut tree that separates `rects` inside `rect` with straight through-cuts, each removing `kerf`,
 * or returns null when none exists (a pinwheel, overlapping rectangles, parts closer than one kerf) or when every
 * tree needs more than `maxStages` stages.
 *
 * - `rect`: the usable area (after edge trim); `rects` must lie inside it. Item leaves carry `itemId` (default: the
 *   index in `rects`) and `rotated` (default false).
 * - A cut node `axis = pos` removes [pos, pos + kerf]; see `CutNode` in `lib/nesting/pack/types.ts`. A cut flush with
 *   the far edge omits its second child; one that shaves a sliver thinner than the kerf off the low edge has
 *   pos < the rect's low edge and an empty (zero-size) leftover as its first child.
 * - Stages: consecutive cuts in the same direction form one stage. With `firstAxis` the first stage runs that way
 *   (`'y'`: rips, lines y = const, as in strip cutting) and a layout needing no such cut starts at stage 2;
 *   without it both directions are tried and the tree with fewer stages wins.
 * - The tree is canonical: at each stage it cuts at every possible gap, which needs the fewest stages for the
 *   chosen first direction.
 */
export function findGuillotineTree(
  rect: Rect,
  rects: readonly GuillotineItem[],
  kerf: number,
  maxStages = Infinity,
  firstAxis?: Axis,
): CutNode | null {
  const items: Item[] = rects.map((r, i) => ({ x: r.x, y: r.y, w: r.w, h: r.h, itemId: r.itemId ?? i, rotated: r.rotated ?? false }));
  const axes: Axis[] = firstAxis ? [firstAxis] : ['y', 'x'];
  let best: CutNode | null = null;
  let bestStages = Infinity;
  for (const axis of axes) {
    const tree = build(rect, items, { axis, stage: 1 }, null, false, kerf, maxStages);
    if (!tree) continue;
    const stages = countStages(tree, firstAxis);
    if (stages < bestStages) [best, bestStages] = [tree, stages];
  }
  return best;
}

/**
 * Number of stages of a tree: consecutive cuts in one direction count as one stage. With `firstAxis`, a tree whose
 * first cut runs the other way starts at stage 2 (its first stage is empty).
 */
export function countStages(tree: CutNode, firstAxis?: Axis): number {
  let max = 0;
  const walk = (node: CutNode, parent: Level | null) => {
    if (node.type !== 'cut') return;
    const stage = !parent ? (firstAxis && node.axis !== firstAxis ? 2 : 1) : node.axis === parent.axis ? parent.stage : parent.stage + 1;
    max = Math.max(max, stage);
    for (const c of node.children) walk(c, { axis: node.axis, stage });
  };
  walk(tree, null);
  return max;
}

/** The item and leftover leaves of a tree, left to right. */
export function treeLeaves(tree: CutNode): Exclude<CutNode, { type: 'cut' }>[] {
  if (tree.type !== 'cut') return [tree];
  return tree.children.flatMap(treeLeaves);
}

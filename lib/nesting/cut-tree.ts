/** Cut-tree helpers: moving a packed tree onto its stock piece, adding the edge-trim cuts, checking a tree. */
import type { Rect } from '@/lib/geometry/rect';
import type { CutNode } from '@/lib/nesting/pack/types';
import { highEdge, lowEdge, sameRect, slice, type Axis } from '@/lib/geometry/axis';
import { EPS } from '@/lib/nesting/guillotine';

const shift = (r: Rect, dx: number, dy: number): Rect => ({ x: r.x + dx, y: r.y + dy, w: r.w, h: r.h });

/** The tree moved by (dx, dy): from a bin's trimmed origin to stock coordinates. */
export function translateTree(node: CutNode, dx: number, dy: number): CutNode {
  const rect = shift(node.rect, dx, dy);
  if (node.type !== 'cut') return { ...node, rect };
  const children = node.children.map((c) => translateTree(c, dx, dy)) as [CutNode] | [CutNode, CutNode];
  return { ...node, rect, pos: node.pos + (node.axis === 'x' ? dx : dy), children };
}

/** Trim cuts along `axis` around `inner`: low edge first, then the high edge; `full` is the piece before them. */
function trimAlong(inner: CutNode, full: Rect, axis: Axis, trim: number, kerf: number): CutNode {
  const o0 = lowEdge(full, axis);
  const o1 = highEdge(full, axis);
  const farWaste = o1 - trim + kerf;
  const highCut: CutNode = {
    type: 'cut',
    rect: slice(full, axis, o0 + trim, o1),
    axis,
    pos: o1 - trim,
    kerf,
    children: o1 - farWaste > EPS ? [inner, { type: 'leftover', rect: slice(full, axis, farWaste, o1) }] : [inner],
  };
  return {
    type: 'cut',
    rect: full,
    axis,
    pos: o0 + trim - kerf,
    kerf,
    children: [{ type: 'leftover', rect: slice(full, axis, o0, Math.max(o0, o0 + trim - kerf)) }, highCut],
  };
}

/**
 * Wraps a tree of the trimmed area in the edge-trim cuts of the whole stock piece, so they come first in the saw
 * order. Trim is per side, kerf included. The edges across the inner tree's first cuts are trimmed first, so the
 * other two trim cuts join the inner tree's first stage (strips: rips off both long edges, then the strips).
 */
export function withTrimCuts(inner: CutNode, stock: Rect, trim: number, kerf: number): CutNode {
  if (trim <= EPS) return inner;
  const innerAxis: Axis = inner.type === 'cut' ? inner.axis : 'y';
  const firstAxis: Axis = innerAxis === 'x' ? 'y' : 'x';
  const afterFirst = slice(stock, firstAxis, lowEdge(stock, firstAxis) + trim, highEdge(stock, firstAxis) - trim);
  return trimAlong(trimAlong(inner, afterFirst, innerAxis, trim, kerf), stock, firstAxis, trim, kerf);
}

/**
 * Trim cuts for a saw that cannot crosscut the whole stock piece (a table saw's sled): the long edges are trimmed
 * first, then the first-stage rips run the stock's whole length, and each strip's ends are trimmed on the strip (a
 * cut as long as the strip is wide). Only for an inner tree whose first cuts are rips across the whole trimmed
 * length; null otherwise (use `withTrimCuts`).
 */
export function withStripEndTrims(inner: CutNode, stock: Rect, trim: number, kerf: number): CutNode | null {
  if (trim <= EPS || inner.type !== 'cut' || inner.axis !== 'y') return null;
  const x0 = lowEdge(stock, 'x');
  const x1 = highEdge(stock, 'x');
  const full = (r: Rect): Rect => ({ ...r, x: x0, w: x1 - x0 });
  const spansUsable = (r: Rect) => Math.abs(r.x - (x0 + trim)) <= EPS && Math.abs(r.x + r.w - (x1 - trim)) <= EPS;
  let ok = true;
  const extend = (node: CutNode): CutNode => {
    if (!spansUsable(node.rect)) ok = false;
    if (node.type === 'leftover') return { ...node, rect: full(node.rect) };
    if (node.type === 'cut' && node.axis === 'y') {
      return { ...node, rect: full(node.rect), children: node.children.map(extend) as [CutNode] | [CutNode, CutNode] };
    }
    return trimAlong(node, full(node.rect), 'x', trim, kerf);
  };
  const extended = extend(inner);
  return ok ? trimAlong(extended, stock, 'y', trim, kerf) : null;
}

/**
 * Trim cuts for a saw that can neither crosscut nor rip the edge off the whole stock piece (a table saw whose rip
 * capacity is less than the sheet's width): the first-stage rips run across the whole piece, the factory edges riding
 * on the outer strips, and each strip is trimmed on its own — its ends by crosscuts as long as it is wide, then its
 * edge by a rip with the strip against the fence. Only for an inner tree whose first cuts are rips across the whole
 * trimmed length; null otherwise.
 */
export function withTrimsOnStrips(inner: CutNode, stock: Rect, trim: number, kerf: number): CutNode | null {
  if (trim <= EPS || inner.type !== 'cut' || inner.axis !== 'y') return null;
  const x0 = lowEdge(stock, 'x');
  const x1 = highEdge(stock, 'x');
  const y0 = lowEdge(stock, 'y');
  const y1 = highEdge(stock, 'y');
  const spansUsable = (r: Rect) => Math.abs(r.x - (x0 + trim)) <= EPS && Math.abs(r.x + r.w - (x1 - trim)) <= EPS;
  let ok = true;
  const band = (from: number, to: number): Rect => ({ x: x0, y: from, w: x1 - x0, h: to - from });
  const strip = (node: CutNode, lowEdgeOn: boolean, highEdgeOn: boolean): CutNode => {
    if (!spansUsable(node.rect)) ok = false;
    const a = lowEdge(node.rect, 'y');
    const b = highEdge(node.rect, 'y');
    const from = lowEdgeOn ? y0 : a;
    const to = highEdgeOn ? y1 : b;
    if (node.type === 'leftover') return { ...node, rect: band(from, to) };
    // The ends first (crosscuts as long as the strip is wide), then the edge: a rip not run together with the
    // first-stage rips, so the saw order makes it on the strip.
    const inner = (f: number, t: number): Rect => ({ x: x0 + trim, y: f, w: x1 - x0 - 2 * trim, h: t - f });
    let t: CutNode = node;
    if (highEdgeOn)
      t = {
        type: 'cut',
        rect: inner(a, to),
        axis: 'y',
        pos: b,
        kerf,
        children: to - (b + kerf) > EPS ? [t, { type: 'leftover', rect: inner(b + kerf, to) }] : [t],
      };
    if (lowEdgeOn)
      t = {
        type: 'cut',
        rect: inner(from, to),
        axis: 'y',
        pos: a - kerf,
        kerf,
        children: [{ type: 'leftover', rect: inner(from, Math.max(from, a - kerf)) }, t],
      };
    return trimAlong(t, band(from, to), 'x', trim, kerf);
  };
  const run = (node: Extract<CutNode, { type: 'cut' }>, first: boolean): CutNode => {
    if (!spansUsable(node.rect)) ok = false;
    const [low, rest] = node.children;
    const top: CutNode = !rest
      ? { type: 'leftover', rect: band(Math.min(y1, node.pos + kerf), y1) }
      : rest.type === 'cut' && rest.axis === 'y'
        ? run(rest, false)
        : strip(rest, false, true);
    return { ...node, rect: band(first ? y0 : lowEdge(node.rect, 'y'), y1), children: [strip(low, first, false), top] };
  };
  const tree = run(inner, true);
  return ok ? tree : null;
}

export interface TreeProblem {
  message: string;
  itemId?: number;
}

/**
 * Checks that a tree is well formed over `rect`: every cut's children are exactly the two sides of the blade,
 * and its item leaves are exactly `items` (by index), each once.
 */
export function checkTree(tree: CutNode, rect: Rect, items: readonly Rect[]): TreeProblem[] {
  const problems: TreeProblem[] = [];
  const seen = new Array<number>(items.length).fill(0);
  const walk = (node: CutNode, expected: Rect) => {
    if (!sameRect(node.rect, expected, EPS)) {
      problems.push({ message: `a ${node.type} node's rectangle does not match the piece it comes from` });
      return;
    }
    if (node.type === 'leftover') return;
    if (node.type === 'item') {
      const item = items[node.itemId];
      if (!item) problems.push({ message: `the tree names item ${node.itemId}, which is not on this piece`, itemId: node.itemId });
      else {
        seen[node.itemId]++;
        if (!sameRect(item, node.rect, EPS))
          problems.push({ message: `the tree's leaf for item ${node.itemId} is not where the part is`, itemId: node.itemId });
      }
      return;
    }
    const a0 = lowEdge(node.rect, node.axis);
    const a1 = highEdge(node.rect, node.axis);
    if (node.pos >= a1 - EPS || node.pos + node.kerf <= a0 + EPS) {
      problems.push({ message: `a cut at ${node.axis} = ${node.pos} misses the piece it should cut` });
      return;
    }
    walk(node.children[0], slice(node.rect, node.axis, a0, Math.max(a0, node.pos)));
    const rest = a1 - (node.pos + node.kerf);
    if (node.children[1]) walk(node.children[1], slice(node.rect, node.axis, node.pos + node.kerf, a1));
    else if (rest > EPS) problems.push({ message: `a cut at ${node.axis} = ${node.pos} drops the material above it` });
  };
  walk(tree, rect);
  seen.forEach((n, i) => {
    if (n !== 1)
      problems.push({ message: n === 0 ? `item ${i} is missing from the cut tree` : `item ${i} appears ${n} times in the cut tree`, itemId: i });
  });
  return problems;
}

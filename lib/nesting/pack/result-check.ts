import { contains, overlaps } from '@/lib/geometry/rect';
import type { Rect } from '@/lib/geometry/rect';
import type { BinType, CutNode, PackItem, PackOptions, PackResult } from './types';

const TOL = 1e-6;
const same = (a: Rect, b: Rect) =>
  Math.abs(a.x - b.x) <= TOL && Math.abs(a.y - b.y) <= TOL && Math.abs(a.w - b.w) <= TOL && Math.abs(a.h - b.h) <= TOL;
const show = (r: Rect) => `(${r.x}, ${r.y}, ${r.w} × ${r.h})`;

/**
 * Every rule a packing result must keep, checked independently of how it was made. Returns the problems found
 * (empty when the result is sound). Used by the tests; cheap enough to run on any result of moderate size.
 */
export function checkPackResult(items: PackItem[], binTypes: BinType[], options: Pick<PackOptions, 'kerf' | 'style'>, result: PackResult): string[] {
  const problems: string[] = [];
  const byId = new Map(items.map((it) => [it.id, it]));
  const seen = new Map<number, number>();
  const note = (id: number) => seen.set(id, (seen.get(id) ?? 0) + 1);
  const used = new Map<number, number>();

  result.bins.forEach((bin, b) => {
    const type = binTypes.find((t) => t.id === bin.binTypeId);
    if (!type) return void problems.push(`bin ${b}: unknown bin type ${bin.binTypeId}`);
    used.set(type.id, (used.get(type.id) ?? 0) + 1);
    const say = (problem: string) => problems.push(`bin ${b}: ${problem}`);
    checkPlacements(bin, type, byId, note, say);
    checkKerfGaps(bin, options.kerf, say);
    checkTree(bin, type, options, say);
  });

  for (const u of result.unplaced) note(u.itemId);
  for (const it of items) {
    const n = seen.get(it.id) ?? 0;
    if (n !== 1) problems.push(`item ${it.id} appears ${n} times (placed or unplaced)`);
  }
  for (const t of binTypes)
    if (t.count !== null && (used.get(t.id) ?? 0) > t.count) problems.push(`bin type ${t.id} used ${used.get(t.id)} times, only ${t.count} in stock`);
  return problems;
}

type Bin = PackResult['bins'][number];
type Say = (problem: string) => void;

/** Each placed item is a known one, turned only if it may be, of its own size, inside the bin; the fill is at most 1. */
function checkPlacements(bin: Bin, type: BinType, byId: Map<number, PackItem>, note: (id: number) => void, say: Say) {
  const binRect = { x: 0, y: 0, w: type.w, h: type.h };
  let area = 0;
  for (const p of bin.items) {
    note(p.itemId);
    const it = byId.get(p.itemId);
    if (!it) {
      say(`unknown item ${p.itemId}`);
      continue;
    }
    if (p.rotated && !it.canRotate) say(`item ${it.id} rotated though it may not be`);
    const [w, h] = p.rotated ? [it.h, it.w] : [it.w, it.h];
    if (Math.abs(p.rect.w - w) > TOL || Math.abs(p.rect.h - h) > TOL) say(`item ${it.id} footprint ${show(p.rect)} is not ${w} × ${h}`);
    if (!contains(binRect, p.rect, TOL)) say(`item ${it.id} ${show(p.rect)} is outside the bin`);
    area += w * h;
  }
  if (area > type.w * type.h + TOL) say('fill above 1');
}

/** Two parts side by side are at least a kerf apart. */
function checkKerfGaps(bin: Bin, k: number, say: Say) {
  for (let i = 0; i < bin.items.length; i++)
    for (let j = i + 1; j < bin.items.length; j++) {
      const a = bin.items[i].rect;
      const c = bin.items[j].rect;
      const grown = { x: a.x - k, y: a.y - k, w: a.w + 2 * k, h: a.h + 2 * k };
      if (overlaps(grown, c, TOL)) say(`items ${bin.items[i].itemId} and ${bin.items[j].itemId} closer than the kerf`);
    }
}

/** The tree: straight through-cuts that reproduce every part exactly (and, in strips style, 3 stages, rips first). */
function checkTree(bin: Bin, type: BinType, options: Pick<PackOptions, 'kerf' | 'style'>, say: Say) {
  const k = options.kerf;
  const binRect = { x: 0, y: 0, w: type.w, h: type.h };
  if (!same(bin.tree.rect, binRect)) say(`tree root ${show(bin.tree.rect)} is not the bin`);
  const leaves = new Map<number, Rect>();
  const walk = (node: CutNode, path: string) => {
    if (node.type === 'item') {
      if (leaves.has(node.itemId)) say(`item ${node.itemId} twice in the tree`);
      leaves.set(node.itemId, node.rect);
      if (options.style === 'strips' && !/^y*x*y?$/.test(path)) say(`item ${node.itemId} reached by cuts ${path}, not 3-stage strips`);
      return;
    }
    if (node.type === 'leftover') return;
    checkCut(node, k, say);
    // Strips: every rip before the first crosscut runs the bin's full length.
    const r = node.rect;
    if (options.style === 'strips' && node.axis === 'y' && !path.includes('x') && (Math.abs(r.x) > TOL || Math.abs(r.w - type.w) > TOL))
      say(`rip y = ${node.pos} before any crosscut does not run the full length`);
    for (const c of node.children) walk(c, path + node.axis);
  };
  walk(bin.tree, '');
  for (const p of bin.items) {
    const leaf = leaves.get(p.itemId);
    if (!leaf) say(`item ${p.itemId} has no leaf in the tree`);
    else if (!same(leaf, p.rect)) say(`item ${p.itemId} leaf ${show(leaf)} differs from ${show(p.rect)}`);
  }
  if (leaves.size !== bin.items.length) say(`the tree holds ${leaves.size} items, the bin ${bin.items.length}`);
}

/** One cut: inside its rect, one kerf wide, its children exactly the two sides (or one side and nothing dropped). */
function checkCut(node: Extract<CutNode, { type: 'cut' }>, k: number, say: Say) {
  const r = node.rect;
  const [lo, len] = node.axis === 'x' ? [r.x, r.w] : [r.y, r.h];
  const end = lo + len;
  if (!(node.pos > lo + TOL && node.pos < end - TOL)) say(`cut ${node.axis} = ${node.pos} is not inside ${show(r)}`);
  if (Math.abs(node.kerf - k) > TOL) say(`cut takes ${node.kerf}, not the kerf ${k}`);
  const first = node.axis === 'x' ? { x: r.x, y: r.y, w: node.pos - r.x, h: r.h } : { x: r.x, y: r.y, w: r.w, h: node.pos - r.y };
  if (!same(node.children[0].rect, first))
    say(`first child ${show(node.children[0].rect)} of cut ${node.axis} = ${node.pos} should be ${show(first)}`);
  const rest = end - node.pos - k;
  if (node.children.length === 2) {
    const second = node.axis === 'x' ? { x: node.pos + k, y: r.y, w: rest, h: r.h } : { x: r.x, y: node.pos + k, w: r.w, h: rest };
    if (!(rest > 0) || !same(node.children[1].rect, second)) say(`second child of cut ${node.axis} = ${node.pos} should be ${show(second)}`);
  } else if (rest > TOL) say(`cut ${node.axis} = ${node.pos} drops ${rest} of material`);
}

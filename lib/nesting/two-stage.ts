/**
 * Two stages of cuts, first along y (rips): full-length strips, each cut into parts that are exactly as wide as the
 * strip (no trim rip, which would be a third stage). A simple constructive packer for saws used with at most 2
 * stages: strips are opened tallest part first and filled with parts of that very width, first fit by length.
 * Crosscuts first is the same on the mirrored problem (`ruledPack` in optimize.ts).
 */
import { EPS, findGuillotineTree } from '@/lib/nesting/guillotine';
import type { PackFn, PackItem, PackResult, PackedItem } from '@/lib/nesting/pack/types';

interface Oriented {
  item: PackItem;
  w: number;
  h: number;
  rotated: boolean;
}

export const packTwoStage: PackFn = async (items, bins, options) => {
  const { kerf } = options;
  const result: PackResult = { bins: [], unplaced: [] };
  const left = new Map(bins.map((b) => [b.id, b.count]));
  const order = [...bins].sort((a, b) => a.priority - b.priority || a.cost / (a.w * a.h) - b.cost / (b.w * b.h) || b.w * b.h - a.w * a.h);
  let rest: PackItem[] = [];
  for (const it of items) {
    const straight = bins.some((b) => fitsBin(it, b, false));
    const turned = bins.some((b) => fitsBin(it, b, true));
    if (straight || (it.canRotate && turned)) rest.push(it);
    else result.unplaced.push({ itemId: it.id, reason: turned ? 'grain' : 'too-large' });
  }
  while (rest.length) {
    const bin = order.find((b) => left.get(b.id) !== 0 && rest.some((it) => fitsBin(it, b, false) || (it.canRotate && fitsBin(it, b, true))));
    if (!bin) {
      for (const it of rest) result.unplaced.push({ itemId: it.id, reason: 'no-stock-left' });
      break;
    }
    const count = left.get(bin.id);
    if (count !== null && count !== undefined) left.set(bin.id, count - 1);
    const { placed, used } = stripsInBin(orientedFor(rest, bin), bin, kerf);
    const tree = findGuillotineTree(
      { x: 0, y: 0, w: bin.w, h: bin.h },
      placed.map((p) => ({ ...p.rect, itemId: p.itemId, rotated: p.rotated })),
      kerf,
      2,
      'y',
    );
    if (!tree || placed.length === 0) throw new Error('two-stage packing made a layout it cannot cut');
    result.bins.push({ binTypeId: bin.id, items: placed, tree });
    rest = rest.filter((it) => !used.has(it.id));
  }
  return result;
};

type Bin = Parameters<PackFn>[1][number];

const fitsBin = (it: PackItem, b: Bin, rotated: boolean) =>
  rotated ? it.h <= b.w + EPS && it.w <= b.h + EPS : it.w <= b.w + EPS && it.h <= b.h + EPS;

/** Each part as it lies in this bin: straight when it fits so, else turned (where grain allows); tallest first. */
function orientedFor(rest: PackItem[], bin: Bin): Oriented[] {
  return rest
    .map((item) =>
      fitsBin(item, bin, false)
        ? { item, w: item.w, h: item.h, rotated: false }
        : item.canRotate && fitsBin(item, bin, true)
          ? { item, w: item.h, h: item.w, rotated: true }
          : null,
    )
    .filter((o): o is Oriented => o !== null)
    .sort((a, b) => b.h - a.h || b.w - a.w);
}

/** Full-length strips, each opened by the tallest part left and filled with parts of exactly its width, first fit. */
function stripsInBin(oriented: Oriented[], bin: Bin, kerf: number) {
  const placed: PackedItem[] = [];
  const used = new Set<number>();
  let y = 0;
  for (const first of oriented) {
    if (used.has(first.item.id) || y + first.h > bin.h + EPS) continue;
    const stripH = first.h;
    let x = 0;
    for (const o of oriented) {
      if (used.has(o.item.id) || Math.abs(o.h - stripH) > EPS || x + o.w > bin.w + EPS) continue;
      placed.push({ itemId: o.item.id, rect: { x, y, w: o.w, h: o.h }, rotated: o.rotated });
      used.add(o.item.id);
      x += o.w + kerf;
    }
    y += stripH + kerf;
  }
  return { placed, used };
}

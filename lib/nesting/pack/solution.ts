import type { BinFiller, FillerKind } from './filler';
import type { BinType, Objective, PackResult } from './types';

/** The packing problem in flat arrays: item `i` is w[i] × h[i]; `ids[i]` is the caller's id. */
export interface Problem {
  n: number;
  ids: Int32Array;
  w: Float64Array;
  h: Float64Array;
  canRotate: Uint8Array;
  area: Float64Array;
  types: BinType[];
  kerf: number;
  objective: Objective;
  filler: FillerKind;
  /** Smallest side of any item: free space narrower than this can never be used. */
  minSide: number;
}

/** One bin of a solution, stored as the recipe that rebuilds it: its items in placement order and the decisions. */
export interface Bin {
  type: number;
  seq: Int32Array;
  how: Int32Array;
  used: number;
  cuts: number;
}

export interface Solution {
  bins: Bin[];
  /** Item indices left out because the limited stock ran out. */
  noStock: number[];
}

/** Fills `f` with the first `len` items of `order` into a fresh bin of type `t`. */
export function fillBin(p: Problem, f: BinFiller, t: number, rule: number, order: ArrayLike<number>, len: number, minArea: number) {
  const bt = p.types[t];
  f.reset(bt.w, bt.h, p.minSide);
  f.fill(p, order, len, rule, minArea);
}

export function binFromFiller(f: BinFiller, t: number): Bin {
  return { type: t, seq: f.placed.slice(0, f.count), how: f.decisions.slice(0, f.count), used: f.used, cuts: f.cuts };
}

/** Everything the objective compares, in one place. */
export interface Score {
  unplaced: number;
  cost: number;
  bins: number;
  priority: number;
  cuts: number;
  /** Σ used² / bin area: larger when the items crowd into fewer, fuller bins (leftovers fewer and larger). */
  concentration: number;
}

export function score(p: Problem, s: Solution): Score {
  let cost = 0;
  let priority = 0;
  let cuts = 0;
  let concentration = 0;
  for (const b of s.bins) {
    const t = p.types[b.type];
    cost += t.cost;
    priority += t.priority;
    cuts += b.cuts;
    concentration += (b.used * b.used) / (t.w * t.h);
  }
  return { unplaced: s.noStock.length, cost, bins: s.bins.length, priority, cuts, concentration };
}

const cmp = (a: number, b: number) => (Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b)) ? 0 : a < b ? -1 : 1);

/**
 * Negative when `a` is better than `b` under the objective. Placing every part comes first; then
 * `cost`: cost, bins, priority (offcuts first); `pieces`: bins, cost, priority; `cuts`: cuts, bins, cost, priority;
 * always last, leftovers fewest and largest.
 */
export function compareScores(objective: Objective, a: Score, b: Score): number {
  const keys: (keyof Score)[] =
    objective === 'cost'
      ? ['cost', 'bins', 'priority']
      : objective === 'pieces'
        ? ['bins', 'cost', 'priority']
        : ['cuts', 'bins', 'cost', 'priority'];
  let c = b.unplaced === a.unplaced ? 0 : a.unplaced < b.unplaced ? -1 : 1;
  for (const k of keys) if (c === 0) c = cmp(a[k], b[k]);
  return c !== 0 ? c : cmp(b.concentration, a.concentration);
}

/** Builds the contract's result (cut trees included) from a solution. */
export function toResult(p: Problem, s: Solution, f: BinFiller, prior: PackResult['unplaced']): PackResult {
  const bins = s.bins.map((b) => {
    const t = p.types[b.type];
    f.reset(t.w, t.h, p.minSide);
    b.seq.forEach((i, k) => f.replay(i, p.w[i], p.h[i], b.how[k]));
    const { tree, items } = f.finish(p.ids);
    return { binTypeId: t.id, items, tree };
  });
  const unplaced = [...prior, ...s.noStock.map((i) => ({ itemId: p.ids[i], reason: 'no-stock-left' as const }))];
  return { bins, unplaced };
}

import type { CutNode, PackedItem } from './types';

/** Tolerance for comparing float lengths (mm): far below any saw's precision. */
export const EPS = 1e-7;

/** The items of a problem in flat arrays: item `i` is w[i] × h[i]. */
export interface ItemTable {
  w: Float64Array;
  h: Float64Array;
  canRotate: Uint8Array;
  area: Float64Array;
}

/**
 * Fills one bin. Every placement is recorded as a decision, so a bin is stored as (placed items, decisions) and
 * rebuilt exactly, cut tree included, by replaying them.
 */
export interface BinFiller {
  reset(binW: number, binH: number, minSide: number): void;
  /** Places what it can of the first `len` items of `order` under `rule` (0 … rules − 1). */
  fill(items: ItemTable, order: ArrayLike<number>, len: number, rule: number, minArea: number): void;
  /** Repeats a recorded placement of item `i`. */
  replay(i: number, w: number, h: number, decision: number): void;
  /** Item area placed so far. */
  readonly used: number;
  /** Cuts in the bin's tree so far. */
  readonly cuts: number;
  readonly count: number;
  /** Placed item indices, in placement order (first `count`). */
  readonly placed: Int32Array;
  /** The decision behind each placement (first `count`). */
  readonly decisions: Int32Array;
  /** The bin's cut tree and placements, item indices mapped to the caller's ids. */
  finish(ids: ArrayLike<number>): { tree: CutNode; items: PackedItem[] };
}

export interface FillerKind {
  /** How many distinct rules the filler understands. */
  rules: number;
  create(capacity: number, kerf: number): BinFiller;
}

import type { CutNode, PackedItem } from './types';

/** Tolerance for comparing float lengths (mm): far below any saw's precision. */
export const EPS = 1e-7;

/**
 * Fills one bin with items offered one at a time. Deterministic: the same bin, rule, minimum side and sequence of
 * offers always gives the same layout, which is how the search stores a bin (its placed sequence) and rebuilds it.
 */
export interface BinFiller {
  reset(binW: number, binH: number, rule: number, minSide: number): void;
  /** Places item `i` (w × h unrotated) when it fits under the filler's rule; true when placed. */
  tryPlace(i: number, w: number, h: number, canRotate: boolean): boolean;
  /** False when no free space could hold a part of this size: a quick reject before `tryPlace`. */
  mayFit(w: number, h: number, canRotate: boolean): boolean;
  /** Item area placed so far. */
  readonly used: number;
  /** Cuts in the bin's tree so far. */
  readonly cuts: number;
  readonly count: number;
  /** Placed item indices, in placement order (first `count`). */
  readonly placed: Int32Array;
  /** The bin's cut tree and placements, item indices mapped to the caller's ids. */
  finish(ids: ArrayLike<number>): { tree: CutNode; items: PackedItem[] };
}

/** How many distinct rules a filler understands (rules are 0 … count − 1). */
export interface FillerKind {
  rules: number;
  create(capacity: number, kerf: number): BinFiller;
}

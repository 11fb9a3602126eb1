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

/** What both fillers share: the record of placements and the item-driven fill loop. */
export abstract class FillerBase {
  used = 0;
  cuts = 0;
  count = 0;
  readonly placed: Int32Array;
  readonly decisions: Int32Array;
  protected readonly px: Float64Array;
  protected readonly py: Float64Array;
  protected readonly pw: Float64Array;
  protected readonly ph: Float64Array;
  protected readonly prot: Uint8Array;

  constructor(capacity: number) {
    this.placed = new Int32Array(capacity);
    this.decisions = new Int32Array(capacity);
    this.px = new Float64Array(capacity);
    this.py = new Float64Array(capacity);
    this.pw = new Float64Array(capacity);
    this.ph = new Float64Array(capacity);
    this.prot = new Uint8Array(capacity);
  }

  /** A quick reject: false when no free space could hold a w × h part either way round. */
  protected abstract mayFit(w: number, h: number): boolean;
  /** Places item `i` where the current rule says, if it fits anywhere; true when placed. */
  protected abstract tryPlace(i: number, w: number, h: number, canRotate: boolean): boolean;

  protected clearRecord() {
    this.used = 0;
    this.cuts = 0;
    this.count = 0;
  }

  /** Records a placement and returns its index. */
  protected record(i: number, x: number, y: number, w: number, h: number, rotated: boolean, decision: number): number {
    const c = this.count++;
    this.placed[c] = i;
    this.decisions[c] = decision;
    this.px[c] = x;
    this.py[c] = y;
    this.pw[c] = w;
    this.ph[c] = h;
    this.prot[c] = rotated ? 1 : 0;
    this.used += w * h;
    return c;
  }

  /** Offers the parts in order, each once. */
  protected fillInOrder(items: ItemTable, order: ArrayLike<number>, len: number, minArea: number, binArea: number) {
    for (let j = 0; j < len; j++) {
      // Free area never exceeds the unfilled area, so once that is below the smallest part nothing more fits.
      if (binArea - this.used < minArea - EPS) break;
      const i = order[j];
      if (this.mayFit(items.w[i], items.h[i])) this.tryPlace(i, items.w[i], items.h[i], items.canRotate[i] === 1);
    }
  }

  protected placements(ids: ArrayLike<number>): PackedItem[] {
    const items: PackedItem[] = [];
    for (let c = 0; c < this.count; c++) {
      items.push({ itemId: ids[this.placed[c]], rect: { x: this.px[c], y: this.py[c], w: this.pw[c], h: this.ph[c] }, rotated: this.prot[c] === 1 });
    }
    return items;
  }
}

import type { BinFiller, FillerKind, ItemTable } from './filler';
import { EPS, FillerBase } from './filler';
import { FlatTree } from './flat-tree';

/**
 * Free-rectangle guillotine filler: every free rectangle is a leaf of the cut tree, and placing a part in one
 * makes at most two through-cuts (one across, one along), leaving at most two new free rectangles. Kerf is taken
 * by each cut; a part flush with a rectangle's far edge needs no cut there.
 *
 * A rule combines which cut to make first (split) with one of two ways to fill:
 * - item-driven: offer the parts in the given order, each to its best free rectangle (placement rule);
 * - space-driven: take the smallest (or lowest) free rectangle and put in it the part that fills it best (largest,
 *   or tightest on the short side), order breaking ties; a rectangle no part fits becomes waste. Slower
 *   (parts × placements) but denser, so it is used up to `SPACE_DRIVEN_MAX` parts.
 */
const enum Place {
  BestShortSide = 0,
  BestArea = 1,
  BestLongSide = 2,
  BottomLeft = 3,
}
const PLACE_RULES = 4;
const enum Split {
  ShorterLeftover = 0,
  LongerLeftover = 1,
  MaxBigPiece = 2,
  ShorterAxis = 3,
}
const SPLIT_RULES = 4;
const ITEM_RULES = PLACE_RULES * SPLIT_RULES;
/** Space-driven variants: free rectangle by smallest area or lowest-left × part by largest area or tightest fit. */
const SPACE_RULES = 4 * SPLIT_RULES;
export const SPACE_DRIVEN_MAX = 2000;

class PanelFiller extends FillerBase implements BinFiller {
  private readonly taken: Uint8Array;
  // Free rectangles and the tree leaf each one is.
  private fx: Float64Array;
  private fy: Float64Array;
  private fw: Float64Array;
  private fh: Float64Array;
  private fnode: Int32Array;
  private nFree = 0;
  private maxFreeArea = 0;
  private maxFreeShort = 0;
  private maxFreeLong = 0;
  private readonly tree: FlatTree;
  private place: Place = Place.BestShortSide;
  private split: Split = Split.ShorterLeftover;
  private minSide = 0;
  private binArea = 0;

  constructor(
    capacity: number,
    private readonly kerf: number,
  ) {
    super(capacity);
    this.taken = new Uint8Array(capacity);
    this.fx = new Float64Array(capacity + 2);
    this.fy = new Float64Array(capacity + 2);
    this.fw = new Float64Array(capacity + 2);
    this.fh = new Float64Array(capacity + 2);
    this.fnode = new Int32Array(capacity + 2);
    this.tree = new FlatTree(4 * capacity + 2);
  }

  reset(binW: number, binH: number, minSide: number) {
    this.clearRecord();
    this.minSide = minSide;
    this.binArea = binW * binH;
    this.tree.clear();
    const root = this.tree.leaf(0, 0, binW, binH);
    this.nFree = 0;
    this.addFree(root, 0, 0, binW, binH);
    this.refreshMax();
  }

  fill(items: ItemTable, order: ArrayLike<number>, len: number, rule: number, minArea: number) {
    this.split = (rule % SPLIT_RULES) as Split;
    const mode = Math.floor(rule / SPLIT_RULES);
    if (rule >= ITEM_RULES && len <= SPACE_DRIVEN_MAX) return this.fillBySpace(items, order, len, mode - PLACE_RULES, minArea);
    this.place = (mode % PLACE_RULES) as Place;
    this.fillInOrder(items, order, len, minArea, this.binArea);
  }

  replay(i: number, w: number, h: number, decision: number) {
    const rot = (decision & 1) === 1;
    this.split = ((decision >> 1) & 3) as Split;
    const node = decision >> 3;
    let r = 0;
    while (r < this.nFree && this.fnode[r] !== node) r++;
    if (r === this.nFree) throw new Error(`internal: replayed placement of item ${i} names no free rectangle`);
    this.commit(i, r, rot ? h : w, rot ? w : h, rot);
  }

  private fillBySpace(items: ItemTable, order: ArrayLike<number>, len: number, variant: number, minArea: number) {
    const lowest = (variant & 1) === 1;
    const tightest = (variant & 2) === 2;
    const taken = this.taken;
    for (let j = 0; j < len; j++) taken[j] = 0;
    let left = len;
    const { fx, fy, fw, fh } = this;
    while (this.nFree > 0 && left > 0) {
      // The free rectangle to fill next.
      let r = 0;
      for (let q = 1; q < this.nFree; q++) {
        if (lowest ? fy[q] < fy[r] - EPS || (fy[q] <= fy[r] + EPS && fx[q] < fx[r]) : fw[q] * fh[q] < fw[r] * fh[r]) r = q;
      }
      const W = fw[r];
      const H = fh[r];
      if (W * H < minArea - EPS) {
        this.removeFree(r);
        continue;
      }
      let bestJ = -1;
      let bestRot = false;
      let s1 = Infinity;
      let s2 = Infinity;
      for (let j = 0; j < len; j++) {
        if (taken[j]) continue;
        const i = order[j];
        const w = items.w[i];
        const h = items.h[i];
        const turns = items.canRotate[i] === 1 && w !== h ? 2 : 1;
        for (let o = 0; o < turns; o++) {
          const iw = o === 0 ? w : h;
          const ih = o === 0 ? h : w;
          if (iw > W + EPS || ih > H + EPS) continue;
          const dw = W - iw;
          const dh = H - ih;
          const short = dw < dh ? dw : dh;
          const a = tightest ? short : -(iw * ih);
          const b = tightest ? -(iw * ih) : short;
          if (a < s1 - EPS || (a <= s1 + EPS && b < s2 - EPS)) {
            s1 = a;
            s2 = b;
            bestJ = j;
            bestRot = o === 1;
          }
        }
      }
      if (bestJ < 0) {
        this.removeFree(r); // no part fits: the rectangle stays a leftover leaf of the tree
        continue;
      }
      taken[bestJ] = 1;
      left--;
      const i = order[bestJ];
      this.commit(i, r, bestRot ? items.h[i] : items.w[i], bestRot ? items.w[i] : items.h[i], bestRot);
    }
  }

  protected mayFit(w: number, h: number): boolean {
    // Orientation does not matter here: a part fits a rectangle only if its short side fits the rectangle's short
    // side and its long side the long side.
    if (w * h > this.maxFreeArea + EPS) return false;
    return (w < h ? w : h) <= this.maxFreeShort + EPS && (w < h ? h : w) <= this.maxFreeLong + EPS;
  }

  protected tryPlace(i: number, w: number, h: number, canRotate: boolean): boolean {
    const { fx, fy, fw, fh } = this;
    let best = -1;
    let bestRot = false;
    let s1 = Infinity;
    let s2 = Infinity;
    const place = this.place;
    for (let r = 0; r < this.nFree; r++) {
      const W = fw[r];
      const H = fh[r];
      for (let o = 0; o < (canRotate && w !== h ? 2 : 1); o++) {
        const iw = o === 0 ? w : h;
        const ih = o === 0 ? h : w;
        if (iw > W + EPS || ih > H + EPS) continue;
        const dw = W - iw;
        const dh = H - ih;
        let a: number;
        let b: number;
        if (place === Place.BestShortSide) {
          a = dw < dh ? dw : dh;
          b = dw < dh ? dh : dw;
        } else if (place === Place.BestArea) {
          a = W * H - iw * ih;
          b = dw < dh ? dw : dh;
        } else if (place === Place.BestLongSide) {
          a = dw < dh ? dh : dw;
          b = dw < dh ? dw : dh;
        } else {
          a = fy[r] + ih;
          b = fx[r];
        }
        if (a < s1 - EPS || (a <= s1 + EPS && b < s2 - EPS)) {
          s1 = a;
          s2 = b;
          best = r;
          bestRot = o === 1;
        }
      }
    }
    if (best < 0) return false;
    this.commit(i, best, bestRot ? h : w, bestRot ? w : h, bestRot);
    return true;
  }

  private commit(i: number, r: number, iw: number, ih: number, rotated: boolean) {
    const k = this.kerf;
    const x = this.fx[r];
    const y = this.fy[r];
    const W = this.fw[r];
    const H = this.fh[r];
    const node = this.fnode[r];
    // The free rectangle is named by its tree leaf, which stays valid when unusable rectangles are dropped.
    const decision = (node << 3) | (this.split << 1) | (rotated ? 1 : 0);
    this.removeFree(r);
    let dw = W - iw;
    let dh = H - ih;
    if (dw < EPS) dw = 0;
    if (dh < EPS) dh = 0;

    let acrossFirst: boolean; // true: the y = const cut (along x, full width of the rect) comes first
    switch (this.split) {
      case Split.ShorterLeftover:
        acrossFirst = dw <= dh;
        break;
      case Split.LongerLeftover:
        acrossFirst = dw > dh;
        break;
      case Split.MaxBigPiece:
        // y-first leaves W × dh and dw × ih; x-first leaves dw × H and iw × dh: keep the larger piece whole.
        acrossFirst = Math.max(W * dh, dw * ih) >= Math.max(dw * H, iw * dh);
        break;
      default:
        acrossFirst = W <= H;
    }
    const t = this.tree;
    let itemNode = node;
    if (acrossFirst) {
      itemNode = this.cutOff(node, true, x, y, W, ih, dh, k);
      itemNode = this.cutOff(itemNode, false, x, y, iw, ih, dw, k);
    } else {
      itemNode = this.cutOff(node, false, x, y, iw, H, dw, k);
      itemNode = this.cutOff(itemNode, true, x, y, iw, ih, dh, k);
    }
    t.setItem(itemNode, i, rotated, iw, ih);
    this.record(i, x, y, iw, ih, rotated, decision);
    this.refreshMax();
  }

  /**
   * Cuts leaf `node` so that a piece (x, y, keepW, keepH) remains below the cut; `rest` is how much lies beyond it.
   * Returns the kept piece's leaf; the far piece (after kerf) becomes a free rectangle when big enough to use.
   */
  private cutOff(node: number, alongX: boolean, x: number, y: number, keepW: number, keepH: number, rest: number, k: number) {
    if (rest <= 0) return node;
    const t = this.tree;
    const kept = t.leaf(x, y, keepW, keepH);
    let far = -1;
    const farSize = rest - k;
    if (farSize > EPS) {
      far = alongX ? t.leaf(x, y + keepH + k, keepW, farSize) : t.leaf(x + keepW + k, y, farSize, keepH);
    }
    t.cut(node, alongX, alongX ? y + keepH : x + keepW, kept, far);
    this.cuts++;
    if (far >= 0) {
      const fw = alongX ? keepW : farSize;
      const fh = alongX ? farSize : keepH;
      if (fw >= this.minSide - EPS && fh >= this.minSide - EPS) this.addFree(far, alongX ? x : x + keepW + k, alongX ? y + keepH + k : y, fw, fh);
    }
    return kept;
  }

  private addFree(node: number, x: number, y: number, w: number, h: number) {
    const n = this.nFree++;
    this.fx[n] = x;
    this.fy[n] = y;
    this.fw[n] = w;
    this.fh[n] = h;
    this.fnode[n] = node;
  }

  private removeFree(r: number) {
    // Keep the order (it breaks placement ties), so shift rather than swap.
    const n = --this.nFree;
    this.fx.copyWithin(r, r + 1, n + 1);
    this.fy.copyWithin(r, r + 1, n + 1);
    this.fw.copyWithin(r, r + 1, n + 1);
    this.fh.copyWithin(r, r + 1, n + 1);
    this.fnode.copyWithin(r, r + 1, n + 1);
  }

  private refreshMax() {
    let a = 0;
    let short = 0;
    let long = 0;
    for (let r = 0; r < this.nFree; r++) {
      const w = this.fw[r];
      const h = this.fh[r];
      if (w * h > a) a = w * h;
      if ((w < h ? w : h) > short) short = w < h ? w : h;
      if ((w < h ? h : w) > long) long = w < h ? h : w;
    }
    this.maxFreeArea = a;
    this.maxFreeShort = short;
    this.maxFreeLong = long;
  }

  finish(ids: ArrayLike<number>) {
    return { tree: this.tree.toCutNode(0, this.kerf, ids), items: this.placements(ids) };
  }
}

export const panelFiller: FillerKind = {
  rules: ITEM_RULES + SPACE_RULES,
  create: (capacity, kerf) => new PanelFiller(capacity, kerf),
};

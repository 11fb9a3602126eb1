import type { BinFiller, FillerKind, ItemTable } from './filler';
import { EPS, FillerBase } from './filler';
import { FlatTree } from './flat-tree';

/**
 * Three-stage strip filler: rips (y = const) make full-length strips, crosscuts (x = const) cut parts from a strip
 * left to right, and a part lower than its strip gets one trim rip. A strip's height is set by the part that opens
 * it. Rule 0 lays a part that opens a strip flat (lower strips), rule 1 stands it up (fewer, taller strips).
 */
class StripFiller extends FillerBase implements BinFiller {
  private readonly pstrip: Int32Array;
  // Strips: bottom y, height, next free x.
  private readonly sy: Float64Array;
  private readonly sh: Float64Array;
  private readonly sx: Float64Array;
  private nStrips = 0;
  private nextY = 0;
  private binW = 0;
  private binH = 0;
  private standUp = false;
  private readonly tree: FlatTree;

  constructor(
    capacity: number,
    private readonly kerf: number,
  ) {
    super(capacity);
    this.pstrip = new Int32Array(capacity);
    this.sy = new Float64Array(capacity);
    this.sh = new Float64Array(capacity);
    this.sx = new Float64Array(capacity);
    // Per strip: the strip and the remainder above; per part: segment, remainder, part and trim waste.
    this.tree = new FlatTree(6 * capacity + 2);
  }

  reset(binW: number, binH: number) {
    this.clearRecord();
    this.nStrips = 0;
    this.nextY = 0;
    this.binW = binW;
    this.binH = binH;
  }

  fill(items: ItemTable, order: ArrayLike<number>, len: number, rule: number, minArea: number) {
    this.standUp = rule % 2 === 1;
    this.fillInOrder(items, order, len, minArea, this.binW * this.binH);
  }

  replay(i: number, w: number, h: number, decision: number) {
    const rot = (decision & 1) === 1;
    const s = decision >> 1;
    const iw = rot ? h : w;
    const ih = rot ? w : h;
    if (s === this.nStrips) this.openStrip(i, iw, ih, rot);
    else this.put(i, s, iw, ih, rot);
  }

  protected mayFit(w: number, h: number): boolean {
    const short = w < h ? w : h;
    if (this.binH - this.nextY >= short - EPS) return true;
    for (let s = 0; s < this.nStrips; s++) if (this.binW - this.sx[s] >= short - EPS && this.sh[s] >= short - EPS) return true;
    return false;
  }

  protected tryPlace(i: number, w: number, h: number, canRotate: boolean): boolean {
    const W = this.binW;
    // Best fit into an open strip: the least height wasted, then the least length left.
    let best = -1;
    let bestRot = false;
    let s1 = Infinity;
    let s2 = Infinity;
    for (let s = 0; s < this.nStrips; s++) {
      const room = W - this.sx[s];
      const sh = this.sh[s];
      for (let o = 0; o < (canRotate && w !== h ? 2 : 1); o++) {
        const iw = o === 0 ? w : h;
        const ih = o === 0 ? h : w;
        if (iw > room + EPS || ih > sh + EPS) continue;
        const a = sh - ih;
        const b = room - iw;
        if (a < s1 - EPS || (a <= s1 + EPS && b < s2 - EPS)) {
          s1 = a;
          s2 = b;
          best = s;
          bestRot = o === 1;
        }
      }
    }
    if (best >= 0) {
      this.put(i, best, bestRot ? h : w, bestRot ? w : h, bestRot);
      return true;
    }
    // Open a new strip.
    const roomH = this.binH - this.nextY;
    const flatRot = canRotate && (this.standUp ? h < w : w < h);
    for (const rot of canRotate && w !== h ? [flatRot, !flatRot] : [false]) {
      const iw = rot ? h : w;
      const ih = rot ? w : h;
      if (iw > W + EPS || ih > roomH + EPS) continue;
      this.openStrip(i, iw, ih, rot);
      return true;
    }
    return false;
  }

  private openStrip(i: number, iw: number, ih: number, rot: boolean) {
    const s = this.nStrips++;
    this.sy[s] = this.nextY;
    this.sh[s] = ih;
    this.sx[s] = 0;
    if (this.binH - this.nextY - ih > EPS) this.cuts++; // the rip that frees the strip
    this.nextY += ih + this.kerf;
    this.put(i, s, iw, ih, rot);
  }

  private put(i: number, s: number, iw: number, ih: number, rotated: boolean) {
    const x = this.sx[s];
    const c = this.record(i, x, this.sy[s], iw, ih, rotated, (s << 1) | (rotated ? 1 : 0));
    this.pstrip[c] = s;
    if (this.binW - (x + iw) > EPS) this.cuts++; // crosscut after the part
    if (this.sh[s] - ih > EPS) this.cuts++; // trim rip
    this.sx[s] = x + iw + this.kerf;
  }

  finish(ids: ArrayLike<number>) {
    return { tree: this.tree.toCutNode(this.buildTree(), this.kerf, ids), items: this.placements(ids) };
  }

  /** Writes the three-stage tree into the flat tree and returns the root. */
  private buildTree(): number {
    const t = this.tree;
    const k = this.kerf;
    const W = this.binW;
    const H = this.binH;
    t.clear();
    // Parts of each strip in x order (they were placed left to right).
    const byStrip: number[][] = Array.from({ length: this.nStrips }, () => []);
    for (let c = 0; c < this.count; c++) byStrip[this.pstrip[c]].push(c);

    const root = t.leaf(0, 0, W, H);
    let rest = root; // the uncut remainder above the strips so far
    for (let s = 0; s < this.nStrips; s++) {
      const y = this.sy[s];
      const sh = this.sh[s];
      let strip = rest;
      const above = H - (y + sh);
      if (above > EPS) {
        strip = t.leaf(0, y, W, sh);
        const far = above - k > EPS ? t.leaf(0, y + sh + k, W, above - k) : -1;
        t.cut(rest, true, y + sh, strip, far);
        rest = far;
      } else rest = -1;
      let segRest = strip; // the uncut remainder of the strip to the right
      for (const c of byStrip[s]) {
        const x = this.px[c];
        const iw = this.pw[c];
        const ih = this.ph[c];
        let seg = segRest;
        const right = W - (x + iw);
        if (right > EPS) {
          seg = t.leaf(x, y, iw, sh);
          const far = right - k > EPS ? t.leaf(x + iw + k, y, right - k, sh) : -1;
          t.cut(segRest, false, x + iw, seg, far);
          segRest = far;
        } else segRest = -1;
        let itemNode = seg;
        if (sh - ih > EPS) {
          itemNode = t.leaf(x, y, iw, ih);
          const far = sh - ih - k > EPS ? t.leaf(x, y + ih + k, iw, sh - ih - k) : -1;
          t.cut(seg, true, y + ih, itemNode, far);
        }
        t.setItem(itemNode, this.placed[c], this.prot[c] === 1, iw, ih);
      }
    }
    return root;
  }
}

export const stripFiller: FillerKind = {
  rules: 2,
  create: (capacity, kerf) => new StripFiller(capacity, kerf),
};

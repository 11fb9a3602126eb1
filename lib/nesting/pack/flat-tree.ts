import type { CutNode } from './types';

const LEFTOVER = 0;
const ITEM = 1;
const CUT = 2;

/**
 * A cut tree kept in flat typed arrays while a bin is being filled, so the search can build thousands of trial
 * bins without allocating node objects; `toCutNode` turns the kept ones into the contract's objects.
 */
export class FlatTree {
  size = 0;
  private kind: Uint8Array;
  private axisY: Uint8Array;
  private rotated: Uint8Array;
  private rx: Float64Array;
  private ry: Float64Array;
  private rw: Float64Array;
  private rh: Float64Array;
  private pos: Float64Array;
  private c0: Int32Array;
  private c1: Int32Array;
  private item: Int32Array;

  constructor(capacity: number) {
    this.kind = new Uint8Array(capacity);
    this.axisY = new Uint8Array(capacity);
    this.rotated = new Uint8Array(capacity);
    this.rx = new Float64Array(capacity);
    this.ry = new Float64Array(capacity);
    this.rw = new Float64Array(capacity);
    this.rh = new Float64Array(capacity);
    this.pos = new Float64Array(capacity);
    this.c0 = new Int32Array(capacity);
    this.c1 = new Int32Array(capacity);
    this.item = new Int32Array(capacity);
  }

  clear() {
    this.size = 0;
  }

  /** Adds a leftover leaf and returns its index. */
  leaf(x: number, y: number, w: number, h: number): number {
    const n = this.size++;
    this.kind[n] = LEFTOVER;
    this.rx[n] = x;
    this.ry[n] = y;
    this.rw[n] = w;
    this.rh[n] = h;
    this.c0[n] = -1;
    this.c1[n] = -1;
    return n;
  }

  /** Turns leaf `n` into a cut at `axis = pos`; children are attached with `setChildren`. */
  cut(n: number, axisY: boolean, pos: number, c0: number, c1: number) {
    this.kind[n] = CUT;
    this.axisY[n] = axisY ? 1 : 0;
    this.pos[n] = pos;
    this.c0[n] = c0;
    this.c1[n] = c1;
  }

  /** Turns leaf `n` into an item leaf whose rect is exactly the item's footprint `w × h`. */
  setItem(n: number, item: number, rotated: boolean, w: number, h: number) {
    this.kind[n] = ITEM;
    this.rw[n] = w;
    this.rh[n] = h;
    this.item[n] = item;
    this.rotated[n] = rotated ? 1 : 0;
  }

  /** Builds the contract's tree from node `root`; `ids` maps internal item indices to the caller's ids. */
  toCutNode(root: number, kerf: number, ids: ArrayLike<number>): CutNode {
    // Iterative, because a long chain of cuts in a large sheet could be deeper than the call stack.
    const built: (CutNode | undefined)[] = new Array(this.size);
    const stack: number[] = [root];
    while (stack.length > 0) {
      const n = stack[stack.length - 1];
      if (built[n]) {
        stack.pop();
        continue;
      }
      const rect = { x: this.rx[n], y: this.ry[n], w: this.rw[n], h: this.rh[n] };
      if (this.kind[n] === LEFTOVER) {
        built[n] = { type: 'leftover', rect };
        stack.pop();
      } else if (this.kind[n] === ITEM) {
        built[n] = { type: 'item', rect, itemId: ids[this.item[n]], rotated: this.rotated[n] === 1 };
        stack.pop();
      } else {
        const a = this.c0[n];
        const b = this.c1[n];
        if (!built[a]) stack.push(a);
        else if (b >= 0 && !built[b]) stack.push(b);
        else {
          const first = built[a]!;
          built[n] = {
            type: 'cut',
            rect,
            axis: this.axisY[n] ? 'y' : 'x',
            pos: this.pos[n],
            kerf,
            children: b >= 0 ? [first, built[b]!] : [first],
          };
          stack.pop();
        }
      }
    }
    return built[root]!;
  }
}

import type { BinFiller } from './filler';
import { EPS } from './filler';
import type { Rng } from './prng';
import { randInt } from './prng';
import type { Bin, Problem } from './solution';
import { binFromFiller, fillBin } from './solution';

/** Sort keys for item orders, all descending: the classic "decreasing" heuristics. */
export const ORDER_KEYS = ['area', 'long-side', 'perimeter', 'width', 'height', 'strip-height'] as const;
export type OrderKey = (typeof ORDER_KEYS)[number];
/** Strips pack best tallest strip first (first-fit decreasing height); a part that may turn lies flat. */
export const STRIP_ORDER_KEYS: readonly OrderKey[] = ['strip-height', 'area', 'height', 'long-side', 'perimeter', 'width'];
export const PANEL_ORDER_KEYS: readonly OrderKey[] = ['area', 'long-side', 'perimeter', 'width', 'height'];

const keyCache = new WeakMap<Problem, Map<OrderKey, [Float64Array, Float64Array]>>();

/** Primary and tie-break key of every item for one order, computed once per problem. */
function keysOf(p: Problem, key: OrderKey): [Float64Array, Float64Array] {
  let byKey = keyCache.get(p);
  if (!byKey) keyCache.set(p, (byKey = new Map()));
  let keys = byKey.get(key);
  if (!keys) {
    const k1 = new Float64Array(p.n);
    const k2 = new Float64Array(p.n);
    for (let i = 0; i < p.n; i++) {
      const w = p.w[i];
      const h = p.h[i];
      const [a, b] =
        key === 'area'
          ? [w * h, Math.max(w, h)]
          : key === 'long-side'
            ? [Math.max(w, h), Math.min(w, h)]
            : key === 'perimeter'
              ? [w + h, w * h]
              : key === 'width'
                ? [w, h]
                : key === 'height'
                  ? [h, w]
                  : [p.canRotate[i] ? Math.min(w, h) : h, w * h];
      k1[i] = a;
      k2[i] = b;
    }
    byKey.set(key, (keys = [k1, k2]));
  }
  return keys;
}

export function sortedOrder(p: Problem, items: ArrayLike<number>, key: OrderKey): Int32Array {
  const [k1, k2] = keysOf(p, key);
  // Ties by index keep the order stable and deterministic.
  return Int32Array.from(items).sort((a, b) => k1[b] - k1[a] || k2[b] - k2[a] || a - b);
}

/** Swaps random neighbours: keeps the order roughly decreasing while exploring near it. */
export function perturb(rng: Rng, src: Int32Array, len: number, dst: Int32Array, swapRate: number) {
  dst.set(src.subarray(0, len));
  for (let j = 0; j + 1 < len; j++) {
    if (rng() < swapRate) {
      const t = dst[j];
      dst[j] = dst[j + 1];
      dst[j + 1] = t;
      j++;
    }
  }
}

export interface PoolPacking {
  bins: Bin[];
  /** Items no bin with stock left could take. */
  left: number[];
}

interface Candidate {
  bin: Bin;
  all: boolean;
  cost: number;
  priority: number;
  area: number;
}

/**
 * Packs `order` (already in the preferred order) bin by bin: for each new bin it tries every bin type with stock
 * left (and, with `rng`, `attempts` perturbed orders and rules) and keeps the best fill. `avail` is decremented.
 * With `closeFirst`, a bin type that takes everything left wins outright (the cheapest such); without it, bin
 * types compete on the objective alone (e.g. cost per area placed), which can be cheaper over several bins.
 */
export function packPool(...args: Parameters<typeof packPoolSteps>): PoolPacking {
  const steps = packPoolSteps(...args);
  for (;;) {
    const s = steps.next();
    if (s.done) return s.value;
  }
}

/** `packPool` one bin at a time: yields after each bin so a long job can pause for the event loop. */
export function* packPoolSteps(
  p: Problem,
  f: BinFiller,
  order: Int32Array,
  avail: number[],
  rule: number,
  rng: Rng | null,
  attempts: number,
  scratch: Int32Array,
  mark: Uint8Array,
  closeFirst = true,
): Generator<void, PoolPacking, void> {
  const run: PoolRun = { p, f, avail, rule, rng, attempts, scratch, closeFirst };
  let remaining = order.slice();
  let len = remaining.length;
  const bins: Bin[] = [];
  while (len > 0) {
    const best = bestNextBin(run, remaining, len);
    if (!best) break;
    bins.push(best.bin);
    avail[best.bin.type]--;
    len = dropPacked(remaining, len, best.bin.seq, mark);
    remaining = remaining.subarray(0, len);
    yield;
  }
  return { bins, left: Array.from(remaining.subarray(0, len)) };
}

/** What every bin of one pool packing is chosen with (`packPoolSteps`' arguments). */
interface PoolRun {
  p: Problem;
  f: BinFiller;
  avail: number[];
  rule: number;
  rng: Rng | null;
  attempts: number;
  scratch: Int32Array;
  closeFirst: boolean;
}

/** The next bin: every bin type with stock left, each filled in the given order (and perturbed ones), the best kept. */
function bestNextBin({ p, f, avail, rule, rng, attempts, scratch, closeFirst }: PoolRun, remaining: Int32Array, len: number): Candidate | null {
  const rules = p.filler.rules;
  const minArea = smallestArea(p, remaining, len);
  let best: Candidate | null = null;
  for (let t = 0; t < p.types.length; t++) {
    if (avail[t] <= 0) continue;
    const bt = p.types[t];
    for (let a = 0; a < (rng ? attempts : 1); a++) {
      let ord: Int32Array = remaining;
      let r = rule;
      if (rng && a > 0) {
        perturb(rng, remaining, len, scratch, 0.1 + 0.4 * rng());
        ord = scratch;
        r = randInt(rng, rules);
      }
      fillBin(p, f, t, r, ord, len, minArea);
      if (f.count === 0) break; // nothing fits this type: no order will change that
      const c: Candidate = { bin: null as unknown as Bin, all: f.count === len, cost: bt.cost, priority: bt.priority, area: bt.w * bt.h };
      if (!best || better(p, f.used, c, best, closeFirst)) {
        c.bin = binFromFiller(f, t);
        best = c;
      }
      if (c.all) break; // every remaining item fits: other orders cannot do better in this type
    }
  }
  return best;
}

/** The area of the smallest of the first `len` items of `remaining`. */
function smallestArea(p: Problem, remaining: Int32Array, len: number): number {
  let minArea = Infinity;
  for (let j = 0; j < len; j++) if (p.area[remaining[j]] < minArea) minArea = p.area[remaining[j]];
  return minArea;
}

/** Removes the items of `seq` from the first `len` of `remaining` in place, keeping the order; returns how many are left. */
function dropPacked(remaining: Int32Array, len: number, seq: Int32Array, mark: Uint8Array): number {
  for (let j = 0; j < seq.length; j++) mark[seq[j]] = 1;
  let m = 0;
  for (let j = 0; j < len; j++) {
    const i = remaining[j];
    if (mark[i]) mark[i] = 0;
    else remaining[m++] = i;
  }
  return m;
}

/** Is candidate `c` (its filler having placed `used`) a better next bin than `b`? */
function better(p: Problem, used: number, c: Candidate, b: Candidate, closeFirst: boolean): boolean {
  // Closing the job: the cheapest bin that takes everything left.
  if (closeFirst && c.all !== b.all) return c.all;
  if (c.all && b.all) return c.cost !== b.cost ? c.cost < b.cost : c.priority !== b.priority ? c.priority < b.priority : c.area < b.area - EPS;
  const bu = b.bin.used;
  if (p.objective === 'cost') {
    // Cost per area of parts placed; free offcuts win outright.
    const rc = c.cost * bu;
    const rb = b.cost * used;
    if (Math.abs(rc - rb) > 1e-9 * Math.max(1, rc, rb)) return rc < rb;
    if (c.priority !== b.priority) return c.priority < b.priority;
    return used > bu + EPS;
  }
  if (Math.abs(used - bu) > EPS) return used > bu;
  return c.cost !== b.cost ? c.cost < b.cost : c.priority < b.priority;
}

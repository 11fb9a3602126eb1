/**
 * Lower bounds on the number of identical bins a set of rectangles needs (two-dimensional bin packing). The
 * benchmark measures the packer against them, and the packer stops searching once it meets one.
 *
 * - L0, the continuous bound: ⌈Σ item area / bin area⌉ (with or without rotation).
 * - L1 and L2 for fixed orientation: Martello & Vigo, "Exact solution of the two-dimensional finite bin packing
 *   problem", Management Science 44(3), 1998.
 * - With rotation: Dell'Amico, Martello & Vigo, "A lower bound for the non-oriented two-dimensional bin packing
 *   problem", Discrete Applied Mathematics 118, 2002 (items cut into squares); and our own `rotationBound`, the same
 *   argument on whole items.
 *
 * All are valid for free (non-guillotine) packing, hence also for guillotine packing with any kerf. Sizes may be any
 * positive numbers: each sweep visits the parameter values where its bound can change, so integer instances get
 * the same value as a sweep over every integer 1 … W/2.
 */

export interface Size {
  w: number;
  h: number;
}

const transpose = (s: Size): Size => ({ w: s.h, h: s.w });
/** Guards ⌈x⌉ against float noise in sums of areas (x = 3.0000000001 must stay 3). */
const ceil = (x: number) => Math.ceil(x - 1e-9);
/** Float slack for comparisons of sums like W − q, always applied in the direction that weakens a bound. */
const slack = (bin: Size) => 1e-9 * Math.max(bin.w, bin.h);
/** Past this much work the cardinality term of L1 is skipped for the remaining p (the bound stays valid, only weaker). */
const CARDINALITY_WORK_LIMIT = 2_000_000;

function assertInput(items: readonly Size[], bin: Size, rotation: boolean): void {
  const ok = (n: number) => Number.isFinite(n) && n > 0;
  if (!ok(bin.w) || !ok(bin.h)) throw new RangeError(`bin size must be positive and finite, got ${bin.w} × ${bin.h}`);
  items.forEach((it, i) => {
    if (!ok(it.w) || !ok(it.h)) throw new RangeError(`item ${i} size must be positive and finite, got ${it.w} × ${it.h}`);
    const fits = (it.w <= bin.w && it.h <= bin.h) || (rotation && it.h <= bin.w && it.w <= bin.h);
    if (!fits) {
      throw new RangeError(`item ${i} (${it.w} × ${it.h}) does not fit the ${bin.w} × ${bin.h} bin${rotation ? ' either way round' : ''}`);
    }
  });
}

/** Index of the first element of ascending `xs` that is ≥ v (xs.length when none). */
function lowerIndex(xs: Float64Array, v: number): number {
  let lo = 0;
  let hi = xs.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (xs[mid] < v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Index of the first element of ascending `xs` that is > v. */
function upperIndex(xs: Float64Array, v: number): number {
  let lo = 0;
  let hi = xs.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (xs[mid] <= v) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Running sums: out[i] = Σ values[0 … i−1]. */
function prefixSums(values: ArrayLike<number>): Float64Array {
  const out = new Float64Array(values.length + 1);
  for (let i = 0; i < values.length; i++) out[i + 1] = out[i] + values[i];
  return out;
}

/** L0 = ⌈Σ w·h / (W·H)⌉ — the same with or without rotation. */
export function continuousBound(items: readonly Size[], bin: Size): number {
  let area = 0;
  for (const it of items) area += it.w * it.h;
  return ceil(area / (bin.w * bin.h));
}

/**
 * Martello & Vigo (1998) L1^W: items wider than W/2 can never stand side by side, so they stack along the height
 * like one-dimensional items of their heights. For 1 ≤ p ≤ H/2, over J^W = {w > W/2}: J1 = {h > H − p},
 * J2 = {H − p ≥ h > H/2}, J3 = {H/2 ≥ h ≥ p};
 * L(p) = |J1 ∪ J2| + max(0, ⌈(Σ_J3 h − Σ_J2 (H − h)) / H⌉, ⌈(|J3| − Σ_J2 ⌊(H − h)/p⌋) / ⌊H/p⌋⌉), L1^W = max_p L(p).
 */
function martelloVigoL1W(items: readonly Size[], bin: Size): number {
  const { w: W, h: H } = bin;
  const tall: number[] = [];
  const short: number[] = [];
  for (const it of items) if (it.w > W / 2) (it.h > H / 2 ? tall : short).push(it.h);
  if (short.length === 0) return tall.length;
  const tallAsc = Float64Array.from(tall).sort();
  const shortAsc = Float64Array.from(short).sort();
  const tallSums = prefixSums(tallAsc);
  const shortSums = prefixSums(shortAsc);

  let best = tall.length;
  let work = 0;
  // Where J3 is unchanged the bound only grows with p (J2 shrinks into J1), so p = each short height is enough.
  for (let k = 0; k < shortAsc.length; k++) {
    if (k > 0 && shortAsc[k] === shortAsc[k - 1]) continue;
    const p = shortAsc[k];
    const count3 = shortAsc.length - k;
    const length3 = shortSums[shortAsc.length] - shortSums[k];
    const end2 = upperIndex(tallAsc, H - p + slack(bin)); // J2 = tallAsc[0 … end2)
    const room2 = end2 * H - tallSums[end2];
    let terms = Math.max(0, ceil((length3 - room2) / H));
    work += end2;
    if (work <= CARDINALITY_WORK_LIMIT) {
      let slots2 = 0;
      for (let i = 0; i < end2; i++) slots2 += Math.floor((H - tallAsc[i]) / p + 1e-9);
      terms = Math.max(terms, ceil((count3 - slots2) / Math.floor(H / p + 1e-9)));
    }
    best = Math.max(best, tall.length + terms);
  }
  return best;
}

/**
 * Martello & Vigo (1998) L2^W = max over 1 ≤ q ≤ W/2 of L1 + max(0, ⌈(Σ_{K2∪K3} w·h − (H·L1 − Σ_K1 h)·W) / (W·H)⌉),
 * with K1 = {w > W − q}, K2 = {W − q ≥ w > W/2}, K3 = {W/2 ≥ w ≥ q}: nothing of width ≥ q fits beside an item of K1,
 * so each K1 item takes the bin's full width over its height. `l1` is a valid bound already known (L1 here).
 */
function martelloVigoL2W(items: readonly Size[], bin: Size, l1: number): number {
  const { w: W, h: H } = bin;
  const order = [...items].sort((a, b) => a.w - b.w);
  const widths = Float64Array.from(order, (it) => it.w);
  const heightSums = prefixSums(order.map((it) => it.h));
  const areaSums = prefixSums(order.map((it) => it.w * it.h));
  const n = order.length;

  const candidates = new Set<number>([W / 2]);
  for (const w of widths) if (w <= W / 2) candidates.add(w);
  let best = l1;
  for (const q of candidates) {
    const start1 = upperIndex(widths, W - q + slack(bin)); // K1 = widths[start1 … n)
    const start3 = lowerIndex(widths, q); // K2 ∪ K3 = widths[start3 … start1)
    const fullWidth = heightSums[n] - heightSums[start1];
    const area = areaSums[start1] - areaSums[start3];
    best = Math.max(best, l1 + Math.max(0, ceil((area - (H * l1 - fullWidth) * W) / (W * H))));
  }
  return best;
}

/** Martello & Vigo (1998) L2 = max(L2^W, L2^H) for fixed orientation; it dominates L0 and L1. */
export function martelloVigoL2(items: readonly Size[], bin: Size): number {
  assertInput(items, bin, false);
  return l2Fixed(items, bin);
}

function l2Fixed(items: readonly Size[], bin: Size): number {
  const turned = items.map(transpose);
  const l1 = Math.max(martelloVigoL1W(items, bin), martelloVigoL1W(turned, transpose(bin)));
  return Math.max(continuousBound(items, bin), martelloVigoL2W(items, bin, l1), martelloVigoL2W(turned, transpose(bin), l1));
}

/**
 * One piece of an incompatibility bound (an item, or a square cut from one). `blockFrom`: for every parameter
 * t > blockFrom the piece exceeds W − min(t, W/2) across and H − min(t, H/2) along in every way it can lie.
 */
interface Piece {
  minSide: number;
  area: number;
  /** Wider than W/2 and taller than H/2 in every way it can lie: two such pieces never share a bin. */
  big: boolean;
  blockFrom: number;
  count: number;
}

/**
 * The incompatibility bound behind both rotation bounds, for 0 < t ≤ max(W, H)/2 with q = min(t, W/2),
 * p = min(t, H/2): a "blocking" piece (extents > W − q across and > H − p along whichever way it lies) leaves no room
 * for any piece whose shorter side is ≥ t — they fit neither side by side nor one above the other. With
 * I1 = blocking pieces, I2 = the other big ones, I3 = the remaining pieces with shorter side ≥ t:
 * bins ≥ ⌈(|I1|·W·H + Σ_{I2 ∪ I3} area) / (W·H)⌉, and bins ≥ number of big pieces.
 */
function incompatibilityBound(pieces: Piece[], bin: Size): number {
  const { w: W, h: H } = bin;
  const binArea = W * H;
  const big = pieces.filter((p) => p.big).sort((a, b) => a.blockFrom - b.blockFrom);
  const rest = pieces.filter((p) => !p.big).sort((a, b) => a.minSide - b.minSide);
  const blockFrom = Float64Array.from(big, (p) => p.blockFrom);
  const bigCounts = prefixSums(big.map((p) => p.count));
  const bigAreas = prefixSums(big.map((p) => p.area * p.count));
  const sides = Float64Array.from(rest, (p) => p.minSide);
  const restAreas = prefixSums(rest.map((p) => p.area * p.count));
  const bigCount = bigCounts[big.length];
  const bigArea = bigAreas[big.length];

  // Where I3 is unchanged the bound only grows with t (I1 grows), so t = each side up to max(W, H)/2 is enough.
  const top = Math.max(W, H) / 2;
  const candidates = new Set<number>([top]);
  for (const side of sides) if (side <= top) candidates.add(side);
  let best = bigCount;
  for (const t of candidates) {
    const blocking = lowerIndex(blockFrom, t - slack(bin)); // pieces with blockFrom < t
    const area3 = restAreas[rest.length] - restAreas[lowerIndex(sides, t)];
    const total = bigCounts[blocking] * binArea + (bigArea - bigAreas[blocking]) + area3;
    best = Math.max(best, ceil(total / binArea));
  }
  return best;
}

/**
 * Adds the squares Euclid's algorithm cuts from a w × h rectangle (⌊long/short⌋ squares of the short side, then the
 * same on the rest) to `counts` (side → how many). Squares thinner than `smallest` are dropped: leaving pieces out
 * only relaxes the problem further.
 */
function addSquares(w: number, h: number, smallest: number, counts: Map<number, number>): void {
  let long = Math.max(w, h);
  let short = Math.min(w, h);
  while (short >= smallest) {
    const count = Math.floor(long / short + 1e-9);
    counts.set(short, (counts.get(short) ?? 0) + count);
    [long, short] = [short, Math.max(0, long - count * short)];
  }
}

/**
 * Dell'Amico, Martello & Vigo (2002), for items that may be turned, as we reconstruct it: cut every item into squares
 * (Euclid's algorithm) — squares lie the same either way — and bound the squares as in `incompatibilityBound`; at
 * least L0. On the 500 standard instances this gives the reference totals exactly, class by class (6,769;
 * bench/data/README.md). For bins that are not square the argument runs with q = min(t, W/2), p = min(t, H/2).
 */
export function dellAmicoMartelloVigo(items: readonly Size[], bin: Size): number {
  assertInput(items, bin, true);
  return squaresBound(items, bin);
}

function squaresBound(items: readonly Size[], bin: Size): number {
  const { w: W, h: H } = bin;
  const l0 = continuousBound(items, bin);
  // No square can exceed half of both sides (a sheet twice as long as wide): then the squares' area is all it has.
  if (Math.min(W, H) <= Math.max(W, H) / 2) return l0;
  const counts = new Map<number, number>();
  for (const it of items) addSquares(it.w, it.h, Math.min(W, H) * 1e-3, counts);
  const pieces: Piece[] = [...counts].map(([side, count]) => ({
    minSide: side,
    area: side * side,
    big: side > W / 2 && side > H / 2,
    blockFrom: Math.max(W - side, H - side),
    count,
  }));
  return Math.max(l0, incompatibilityBound(pieces, bin));
}

/**
 * Our own bound for items that may be turned: `incompatibilityBound` on the whole items rather than on squares cut
 * from them (a blocking item takes a whole bin; every other item counts its full area). The argument is the one
 * above (no published source); it is never weaker than `dellAmicoMartelloVigo` on square bins, and it holds for mixed
 * instances too, since letting every item turn only relaxes the problem.
 */
export function rotationBound(items: readonly Size[], bin: Size): number {
  assertInput(items, bin, true);
  return wholeItemBound(items, bin);
}

function wholeItemBound(items: readonly Size[], bin: Size): number {
  const { w: W, h: H } = bin;
  const pieces: Piece[] = items.map((it) => {
    const asListed = it.w <= W && it.h <= H;
    const turned = it.h <= W && it.w <= H;
    const bigAsListed = it.w > W / 2 && it.h > H / 2;
    const bigTurned = it.h > W / 2 && it.w > H / 2;
    return {
      minSide: Math.min(it.w, it.h),
      area: it.w * it.h,
      big: (!asListed || bigAsListed) && (!turned || bigTurned),
      blockFrom: Math.max(asListed ? Math.max(W - it.w, H - it.h) : -Infinity, turned ? Math.max(W - it.h, H - it.w) : -Infinity),
      count: 1,
    };
  });
  return Math.max(continuousBound(items, bin), incompatibilityBound(pieces, bin));
}

/**
 * The strongest bound we have. With rotation: the larger of `dellAmicoMartelloVigo` and `rotationBound`. Fixed
 * orientation: Martello & Vigo's L2, or either rotation bound when higher (a bound for the problem where items may
 * turn holds for the one where they may not). Throws a RangeError naming the item when a size is not a positive
 * finite number or an item fits no way.
 */
export function lowerBound(items: readonly Size[], bin: Size, rotation: boolean): number {
  assertInput(items, bin, rotation);
  if (items.length === 0) return 0;
  // On a square bin rotationBound is never below the squares bound (see its test), so the latter is skipped there.
  const ours = wholeItemBound(items, bin);
  const turned = bin.w === bin.h ? ours : Math.max(ours, squaresBound(items, bin));
  return rotation ? turned : Math.max(l2Fixed(items, bin), turned);
}

/**
 * Lower bounds on the number of identical bins a set of rectangles needs (two-dimensional bin packing). The
 * benchmark measures the packer against them, and the packer stops searching once it meets one.
 *
 * - L0, the continuous bound: ⌈Σ item area / bin area⌉ (with or without rotation).
 * - L1 and L2 for fixed orientation: Martello & Vigo, "Exact solution of the two-dimensional finite bin packing
 *   problem", Management Science 44(3), 1998.
 * - With rotation: an incompatibility bound of the same family, see `rotationBound` (it is NOT the formula of
 *   Dell'Amico, Martello & Vigo, Discrete Applied Mathematics 118, 2002, which we could not reproduce exactly).
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
export function martelloVigoL1W(items: readonly Size[], bin: Size): number {
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
export function martelloVigoL2W(items: readonly Size[], bin: Size, l1: number): number {
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
  const turned = items.map(transpose);
  const l1 = Math.max(martelloVigoL1W(items, bin), martelloVigoL1W(turned, transpose(bin)));
  return Math.max(continuousBound(items, bin), martelloVigoL2W(items, bin, l1), martelloVigoL2W(turned, transpose(bin), l1));
}

/**
 * Bound for items that may be turned a quarter. Two facts about a W × H bin, whichever way each item is turned:
 * - "big" items (wider than W/2 and taller than H/2 in every orientation that fits) never share a bin;
 * - an item whose extents exceed W − q and H − q in every orientation that fits leaves no room for any item whose
 *   shorter side is ≥ q (they can be neither side by side nor one above the other).
 * So for 0 < q ≤ min(W, H)/2, with I1 = those blocking items, I2 = the other big ones, I3 = the rest with shorter
 * side ≥ q: bins ≥ ⌈(|I1|·W·H + Σ_{I2∪I3} area) / (W·H)⌉, and bins ≥ |I1 ∪ I2|.
 * Derived here in the manner of Martello & Vigo's L2 (proof above, no published source); it is valid for mixed
 * instances too, since allowing every item to turn only relaxes the problem.
 */
export function rotationBound(items: readonly Size[], bin: Size): number {
  const { w: W, h: H } = bin;
  const half = Math.min(W, H) / 2;
  const fitting = (it: Size) => [it, transpose(it)].filter((o) => o.w <= W && o.h <= H);

  let bigCount = 0;
  let bigArea = 0;
  /** q must exceed this for the item to block: max over orientations of max(W − w, H − h). */
  const blockFrom: number[] = [];
  const blockArea: number[] = [];
  const small: { side: number; area: number }[] = [];
  for (const it of items) {
    const orientations = fitting(it);
    const area = it.w * it.h;
    if (orientations.every((o) => o.w > W / 2 && o.h > H / 2)) {
      bigCount += 1;
      bigArea += area;
      blockFrom.push(Math.max(...orientations.map((o) => Math.max(W - o.w, H - o.h))));
      blockArea.push(area);
    } else {
      small.push({ side: Math.min(it.w, it.h), area });
    }
  }
  small.sort((a, b) => a.side - b.side);
  const sides = Float64Array.from(small, (s) => s.side);
  const smallAreaSums = prefixSums(small.map((s) => s.area));
  const blockOrder = blockFrom.map((_, i) => i).sort((a, b) => blockFrom[a] - blockFrom[b]);
  const blockAsc = Float64Array.from(blockOrder, (i) => blockFrom[i]);
  const blockAreaSums = prefixSums(blockOrder.map((i) => blockArea[i]));

  // Where I3 is unchanged the bound only grows with q (I1 grows), so q = each small side ≤ half, and half itself.
  const candidates = new Set<number>([half]);
  for (const s of sides) if (s <= half) candidates.add(s);
  let best = bigCount;
  for (const q of candidates) {
    const blocking = lowerIndex(blockAsc, q - slack(bin)); // items with blockFrom < q
    const area3 = smallAreaSums[small.length] - smallAreaSums[lowerIndex(sides, q)];
    const total = blocking * W * H + (bigArea - blockAreaSums[blocking]) + area3;
    best = Math.max(best, ceil(total / (W * H)));
  }
  return Math.max(best, continuousBound(items, bin));
}

/**
 * The best bound we have: L2 of Martello & Vigo (1998) for fixed orientation, `rotationBound` when every item may
 * turn. Throws a RangeError naming the item when a size is not a positive finite number or an item fits no way.
 */
export function lowerBound(items: readonly Size[], bin: Size, rotation: boolean): number {
  assertInput(items, bin, rotation);
  if (items.length === 0) return 0;
  return rotation ? rotationBound(items, bin) : martelloVigoL2(items, bin);
}

import { lowerBound } from '@/lib/nesting/bounds';
import { PANEL_ORDER_KEYS, packPool, packPoolSteps, sortedOrder, STRIP_ORDER_KEYS, type OrderKey } from './construct';
import { EPS } from './filler';
import type { BinFiller } from './filler';
import { packInputSchema, PackInputError } from './pack-input';
import { panelFiller } from './panel-filler';
import { PoolSearch } from './pool-search';
import { mulberry32, randInt } from './prng';
import type { Problem, Solution } from './solution';
import { compareScores, score, toResult } from './solution';
import { stripFiller } from './strip-filler';
import type { BinType, PackItem, PackOptions, PackResult } from './types';

/** Work limits beyond the contract's options, so tests can run the search deterministically. */
export interface PackLimits {
  /** Stop the improvement phase after this many iterations instead of (or as well as) the time budget. */
  maxIterations?: number;
}

/** Yield to the event loop at least this often so a worker can hear a cancel message. */
const YIELD_EVERY_MS = 25;
const PROGRESS_EVERY_MS = 150;
/**
 * Parts × bin types × combinations of the deterministic constructive phase: all combinations up to ~20 parts,
 * one from ~3,000 parts (the rest run, time permitting, in the improvement phase).
 */
const CONSTRUCT_WORK = 3_000;
const STRONG_BOUND_MAX_PARTS = 3_000;
/** Orders tried for each new bin while re-packing in the improvement phase. */
const ATTEMPTS_PER_BIN = 6;

const now = () => performance.now();
const pause = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

export async function packWithLimits(items: PackItem[], bins: BinType[], options: PackOptions, limits: PackLimits = {}): Promise<PackResult> {
  const { signal, onProgress, ...plain } = options;
  const parsed = packInputSchema.safeParse({ items, bins, options: plain });
  if (!parsed.success) throw new PackInputError(parsed.error.issues);
  const t0 = now();

  const { problem: p, prior } = buildProblem(items, bins, options);
  if (p.n === 0 || p.types.length === 0) {
    return { bins: [], unplaced: [...prior, ...Array.from(p.ids, (itemId) => ({ itemId, reason: 'no-stock-left' as const }))] };
  }
  const f = p.filler.create(p.n, p.kerf);
  const search: Search = {
    p,
    f,
    stock: p.types.map((t) => (t.count === null ? Infinity : t.count)),
    scratch: new Int32Array(p.n),
    mark: new Uint8Array(p.n),
    keeper: bestKeeper(p, f, prior, onProgress, t0),
    orderKeys: options.style === 'strips' ? STRIP_ORDER_KEYS : PANEL_ORDER_KEYS,
    signal,
  };
  const constructions = constructor(search);
  await constructPhase(search, constructions);
  await improvePhase(search, constructions, options, limits, t0);

  const result = toResult(p, search.keeper.best!, search.f, prior);
  if (onProgress) onProgress(progressOf(p, result, search.keeper.best!, now() - t0));
  return result;
}

/** What one packing run works with: the problem, its filler and scratch space, the stock left, the best so far. */
interface Search {
  p: Problem;
  f: ReturnType<Problem['filler']['create']>;
  stock: number[];
  scratch: Int32Array;
  mark: Uint8Array;
  keeper: ReturnType<typeof bestKeeper>;
  orderKeys: readonly OrderKey[];
  signal?: AbortSignal;
}

/**
 * The constructive heuristics as numbered combinations of part order × placement rule (× closing policy with several
 * bin types); `run(c)` packs combination c from scratch and offers the result to the keeper.
 */
function constructor({ p, f, stock, scratch, mark, keeper, orderKeys, signal }: Search) {
  const all = Int32Array.from({ length: p.n }, (_, i) => i);
  const orders = orderKeys.map((k) => sortedOrder(p, all, k));
  // With several bin types, each combination runs with and without closing on the cheapest bin that takes all.
  const policies = p.types.length > 1 ? 2 : 1;
  const count = orderKeys.length * p.filler.rules * policies;
  const run = async (c: number) => {
    // Rules vary fastest, so a short run still mixes them; the classic area order comes first.
    const order = orders[Math.floor(c / (p.filler.rules * policies)) % orders.length];
    const rule = Math.floor(c / policies) % p.filler.rules;
    const steps = packPoolSteps(p, f, order, stock.slice(), rule, null, 1, scratch, mark, c % policies === 0);
    for (;;) {
      const s = steps.next();
      if (s.done) return void keeper.offer({ bins: s.value.bins, noStock: s.value.left });
      await keeper.breathe();
      // A cancel drops this construction unless it is the first (a plan must come back).
      if (signal?.aborted && keeper.best) return;
    }
  };
  return { count, run, next: 0 };
}

/**
 * Constructive phase: as many combinations as the job size allows (never the clock), so the first plan is the same
 * under any load and comes fast even for thousands of parts.
 */
async function constructPhase({ p, keeper, signal }: Search, constructions: ReturnType<typeof constructor>) {
  const first = Math.max(1, Math.min(constructions.count, Math.floor(CONSTRUCT_WORK / (p.n * p.types.length))));
  while (constructions.next < first) {
    await constructions.run(constructions.next++);
    if (signal?.aborted) break;
    await keeper.breathe();
  }
  keeper.reportNow();
}

/**
 * Improvement phase, on the clock: the remaining combinations, then re-packing — eliminating bins when there is one
 * bin type with enough stock and a bin-count objective, improving the mix otherwise — until the budget, a cancel or
 * the lower bound.
 */
async function improvePhase(search: Search, constructions: ReturnType<typeof constructor>, options: PackOptions, limits: PackLimits, t0: number) {
  const { p, f, stock, scratch, mark, keeper, orderKeys, signal } = search;
  let lb: number | null | undefined; // computed on the first iteration: a zero budget never pays for it
  const rng = mulberry32(options.seed);
  let cur: Solution = keeper.best!;
  let curScore = keeper.bestScore!;
  const maxIter = limits.maxIterations ?? Infinity;
  let pooled: PoolSearch | null = null;
  for (let iter = 0; iter < maxIter; iter++) {
    if (signal?.aborted) break;
    if (limits.maxIterations === undefined && now() - t0 >= options.timeBudgetMs) break;
    const b: Solution = keeper.best!;
    if (lb === undefined) lb = binLowerBound(p);
    if (lb !== null && b.noStock.length === 0 && b.bins.length <= lb && p.objective !== 'cuts') break;
    if (constructions.next < constructions.count) {
      await constructions.run(constructions.next++);
      cur = keeper.best!;
      curScore = keeper.bestScore!;
      await keeper.breathe();
      continue;
    }
    if (!pooled && p.types.length === 1 && p.objective !== 'cuts' && b.noStock.length === 0 && b.bins.length > 1)
      pooled = new PoolSearch(p, b, orderKeys);
    if (pooled) {
      const fewer = pooled.step(f, rng, ATTEMPTS_PER_BIN, scratch, mark);
      if (fewer) keeper.offer(fewer);
      await keeper.breathe();
      continue;
    }
    if (cur.bins.length === 0) break;
    const cand = repackSome(p, f, cur, stock, orderKeys, rng, scratch, mark);
    const candScore = score(p, cand);
    if (compareScores(p.objective, candScore, curScore) < 0) {
      cur = cand;
      curScore = candScore;
      keeper.offer(cand);
    }
    await keeper.breathe();
  }
}

/**
 * Keeps the best solution seen, and lets the search breathe: it yields to the event loop every few milliseconds (so
 * a worker hears a cancel) and reports progress on the best so far.
 */
function bestKeeper(p: Problem, f: BinFiller, prior: PackResult['unplaced'], onProgress: PackOptions['onProgress'], t0: number) {
  let lastYield = now();
  let lastProgress = lastYield;
  const keeper = {
    best: null as Solution | null,
    bestScore: null as ReturnType<typeof score> | null,
    /** Takes `s` if it beats the best; says whether it did. */
    offer(s: Solution): boolean {
      const sc = score(p, s);
      if (!keeper.best || compareScores(p.objective, sc, keeper.bestScore!) < 0) {
        keeper.best = s;
        keeper.bestScore = sc;
        return true;
      }
      return false;
    },
    async breathe(): Promise<void> {
      const t = now();
      if (t - lastYield < YIELD_EVERY_MS) return;
      if (onProgress && keeper.best && t - lastProgress >= PROGRESS_EVERY_MS) {
        lastProgress = t;
        report(p, f, keeper.best, prior, onProgress, t - t0);
      }
      await pause();
      lastYield = now();
    },
    reportNow(): void {
      if (!onProgress) return;
      lastProgress = now();
      report(p, f, keeper.best!, prior, onProgress, lastProgress - t0);
    },
  };
  return keeper;
}

/**
 * One move of the improvement phase: empty a few bins (one of the emptiest most often, plus one to three at random)
 * and pack their parts, with those no stock took, again into what stock is left.
 */
function repackSome(
  p: Problem,
  f: BinFiller,
  cur: Solution,
  stock: number[],
  orderKeys: readonly OrderKey[],
  rng: () => number,
  scratch: Int32Array,
  mark: Uint8Array,
): Solution {
  const nb = cur.bins.length;
  const ranked = cur.bins.map((bin, k) => k).sort((x, y) => fill(p, cur.bins[x]) - fill(p, cur.bins[y]) || x - y);
  const chosen = new Set<number>([ranked[Math.floor(rng() ** 3 * Math.min(nb, 4))]]);
  const extra = Math.min(nb - 1, 1 + randInt(rng, 3));
  while (chosen.size < 1 + extra) chosen.add(randInt(rng, nb));

  const avail = stock.slice();
  const kept = [];
  const pool: number[] = [...cur.noStock];
  for (let k = 0; k < nb; k++) {
    const bin = cur.bins[k];
    if (chosen.has(k)) for (const i of bin.seq) pool.push(i);
    else {
      kept.push(bin);
      avail[bin.type]--;
    }
  }
  const key = rng() < 0.6 ? orderKeys[0] : orderKeys[randInt(rng, orderKeys.length)];
  const packing = packPool(p, f, sortedOrder(p, pool, key), avail, randInt(rng, p.filler.rules), rng, ATTEMPTS_PER_BIN, scratch, mark, rng() < 0.5);
  return { bins: kept.concat(packing.bins), noStock: packing.left };
}

const fill = (p: Problem, bin: Solution['bins'][number]) => bin.used / (p.types[bin.type].w * p.types[bin.type].h);

function report(
  p: Problem,
  f: BinFiller,
  s: Solution,
  prior: PackResult['unplaced'],
  onProgress: NonNullable<PackOptions['onProgress']>,
  elapsed: number,
) {
  onProgress(progressOf(p, toResult(p, s, f, prior), s, elapsed));
}

function progressOf(p: Problem, result: PackResult, s: Solution, elapsedMs: number) {
  const sc = score(p, s);
  let used = 0;
  let binArea = 0;
  for (const b of s.bins) {
    used += b.used;
    binArea += p.types[b.type].w * p.types[b.type].h;
  }
  return { elapsedMs, binsUsed: sc.bins, fill: binArea > 0 ? used / binArea : 0, cost: sc.cost, best: result };
}

/** Sorts out the items no bin type could ever take, and puts the rest in flat arrays. */
function buildProblem(items: PackItem[], bins: BinType[], options: PackOptions) {
  const prior: PackResult['unplaced'] = [];
  const keep: PackItem[] = [];
  for (const it of items) {
    const straight = bins.some((b) => it.w <= b.w + EPS && it.h <= b.h + EPS);
    const turned = bins.some((b) => it.h <= b.w + EPS && it.w <= b.h + EPS);
    if (straight || (turned && it.canRotate)) keep.push(it);
    else prior.push({ itemId: it.id, reason: turned ? 'grain' : 'too-large' });
  }
  const n = keep.length;
  const p: Problem = {
    n,
    ids: Int32Array.from(keep, (it) => it.id),
    w: Float64Array.from(keep, (it) => it.w),
    h: Float64Array.from(keep, (it) => it.h),
    canRotate: Uint8Array.from(keep, (it) => (it.canRotate ? 1 : 0)),
    area: Float64Array.from(keep, (it) => it.w * it.h),
    types: bins.filter((b) => b.count !== 0),
    kerf: options.kerf,
    objective: options.objective,
    filler: options.style === 'strips' ? stripFiller : panelFiller,
    minSide: keep.reduce((m, it) => Math.min(m, it.w, it.h), Infinity),
  };
  return { problem: p, prior };
}

/** A lower bound on the bins needed when there is one bin type (else null): stop searching once it is reached. */
function binLowerBound(p: Problem): number | null {
  if (p.types.length !== 1) return null;
  const bin = { w: p.types[0].w, h: p.types[0].h };
  let total = 0;
  for (let i = 0; i < p.n; i++) total += p.area[i];
  let lb = Math.ceil(total / (bin.w * bin.h) - 1e-9);
  // The stronger bounds cost O(n²)-ish time (≈ 0.5 s at 20,000 parts, blocking a cancel); big jobs never get
  // near a bound anyway, so they keep the continuous one.
  if (p.n > STRONG_BOUND_MAX_PARTS) return lb;
  const sizes = Array.from({ length: p.n }, (_, i) => ({ w: p.w[i], h: p.h[i] }));
  try {
    lb = Math.max(
      lb,
      lowerBound(
        sizes,
        bin,
        p.canRotate.some((r) => r === 1),
      ),
    );
  } catch {
    // The shared bound refuses odd input (e.g. float sizes it cannot handle): the continuous bound still holds.
  }
  return lb;
}

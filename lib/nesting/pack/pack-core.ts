import { lowerBound } from '@/lib/nesting/bounds';
import { PANEL_ORDER_KEYS, packPool, packPoolSteps, sortedOrder, STRIP_ORDER_KEYS } from './construct';
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
  const stock = p.types.map((t) => (t.count === null ? Infinity : t.count));
  const scratch = new Int32Array(p.n);
  const mark = new Uint8Array(p.n);
  const all = Int32Array.from({ length: p.n }, (_, i) => i);

  let lastYield = now();
  let lastProgress = lastYield;
  let best: Solution | null = null;
  let bestScore = null as ReturnType<typeof score> | null;
  const offer = (s: Solution) => {
    const sc = score(p, s);
    if (!best || compareScores(p.objective, sc, bestScore!) < 0) {
      best = s;
      bestScore = sc;
      return true;
    }
    return false;
  };
  const breathe = async () => {
    const t = now();
    if (t - lastYield < YIELD_EVERY_MS) return;
    if (onProgress && best && t - lastProgress >= PROGRESS_EVERY_MS) {
      lastProgress = t;
      report(p, f, best, prior, onProgress, t - t0);
    }
    await pause();
    lastYield = now();
  };

  // Constructive phase: as many order × rule combinations as the job size allows (never the clock), so the first
  // plan is the same under any load and comes fast even for thousands of parts.
  const orderKeys = options.style === 'strips' ? STRIP_ORDER_KEYS : PANEL_ORDER_KEYS;
  const orders = orderKeys.map((k) => sortedOrder(p, all, k));
  // With several bin types, each combination runs with and without closing on the cheapest bin that takes all.
  const policies = p.types.length > 1 ? 2 : 1;
  const combos = orderKeys.length * p.filler.rules * policies;
  const construct = async (c: number) => {
    // Rules vary fastest, so a short run still mixes them; the classic area order comes first.
    const order = orders[Math.floor(c / (p.filler.rules * policies)) % orders.length];
    const rule = Math.floor(c / policies) % p.filler.rules;
    const steps = packPoolSteps(p, f, order, stock.slice(), rule, null, 1, scratch, mark, c % policies === 0);
    for (;;) {
      const s = steps.next();
      if (s.done) return void offer({ bins: s.value.bins, noStock: s.value.left });
      await breathe();
      // A cancel drops this construction unless it is the first (a plan must come back).
      if (signal?.aborted && best) return;
    }
  };
  let nextCombo = 0;
  const firstCombos = Math.max(1, Math.min(combos, Math.floor(CONSTRUCT_WORK / (p.n * p.types.length))));
  while (nextCombo < firstCombos) {
    await construct(nextCombo++);
    if (signal?.aborted) break;
    await breathe();
  }
  if (onProgress) {
    lastProgress = now();
    report(p, f, best!, prior, onProgress, lastProgress - t0);
  }

  // Improvement phase, on the clock: the remaining combinations, then re-packing.
  let lb: number | null | undefined; // computed on the first iteration: a zero budget never pays for it
  const rng = mulberry32(options.seed);
  let cur: Solution = best!;
  let curScore = bestScore!;
  const maxIter = limits.maxIterations ?? Infinity;
  let pooled: PoolSearch | null = null;
  for (let iter = 0; iter < maxIter; iter++) {
    if (signal?.aborted) break;
    if (limits.maxIterations === undefined && now() - t0 >= options.timeBudgetMs) break;
    const b: Solution = best!;
    if (lb === undefined) lb = binLowerBound(p);
    if (lb !== null && b.noStock.length === 0 && b.bins.length <= lb && p.objective !== 'cuts') break;
    if (nextCombo < combos) {
      await construct(nextCombo++);
      cur = best!;
      curScore = bestScore!;
      await breathe();
      continue;
    }
    // One bin type with enough stock and a bin-count objective: eliminate bins; otherwise improve the mix.
    if (!pooled && p.types.length === 1 && p.objective !== 'cuts' && b.noStock.length === 0 && b.bins.length > 1)
      pooled = new PoolSearch(p, b, orderKeys);
    if (pooled) {
      const fewer = pooled.step(f, rng, ATTEMPTS_PER_BIN, scratch, mark);
      if (fewer) offer(fewer);
      await breathe();
      continue;
    }
    const nb = cur.bins.length;
    if (nb === 0) break;

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
    const cand: Solution = { bins: kept.concat(packing.bins), noStock: packing.left };
    const candScore = score(p, cand);
    if (compareScores(p.objective, candScore, curScore) < 0) {
      cur = cand;
      curScore = candScore;
      offer(cand);
    }
    await breathe();
  }

  const result = toResult(p, best!, f, prior);
  if (onProgress) onProgress(progressOf(p, result, best!, now() - t0));
  return result;
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

/**
 * Time to a first plan (improvement budget 0) and peak memory of the packing core at 100, 1,000 and 10,000 parts:
 * seeded random cabinet-sized parts (half of them grain-locked) on 2440 × 1220 sheets less 10 mm trim, 3.2 mm kerf.
 */
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { packGuillotine } from '@/lib/nesting/pack';
import { mulberry32 } from '@/lib/nesting/pack/prng';
import type { PackItem } from '@/lib/nesting/pack/types';

export const SCALING_SIZES = [100, 1_000, 10_000] as const;
const SAMPLE_EVERY_MS = 2;
/** Timed runs per size below 10,000 parts; the median is reported (one run at 10,000 keeps the section short). */
const REPEATS = 3;
const SHEET = { id: 0, w: 2420, h: 1200, count: null, cost: 96, priority: 2 };
const OPTIONS = { kerf: 3.2, style: 'panel', objective: 'cost', timeBudgetMs: 0, seed: 1 } as const;

export interface ScalingResult {
  parts: number;
  /** Until packGuillotine resolves with its first plan (budget 0); median of the timed runs. */
  ms: number;
  runs: number;
  /** Until its first progress report, if it sends one before resolving (null when it does not). */
  firstProgressMs: number | null;
  sheets: number;
  unplaced: number;
  /** Peak rise over the level before the run, in MB (sampled every few ms, and at the end). */
  heapMb: number;
  rssMb: number;
  /** Rise of the process's peak resident set (getrusage maxrss), in MB: 0 when an earlier peak was higher. */
  maxRssRiseMb: number;
}

export function randomParts(n: number, seed = 42): PackItem[] {
  const rnd = mulberry32(seed);
  // Mostly carcass- and drawer-sized parts, a few long ones; whole millimetres.
  return Array.from({ length: n }, (_, id) => {
    const long = rnd() < 0.1;
    const w = Math.round(long ? 1200 + rnd() * 1200 : 80 + rnd() * 820);
    const h = Math.round(long ? 60 + rnd() * 540 : 60 + rnd() * 540);
    return { id, w, h, canRotate: rnd() < 0.5 };
  });
}

/** The collector, reached without a command-line flag, so memory is measured from a settled heap. */
function collector(): () => void {
  setFlagsFromString('--expose_gc');
  return runInNewContext('gc') as () => void;
}

/** Packs a small job once so the timed runs measure the packer, not the JIT compiling it. */
export async function warmUp(): Promise<void> {
  await packGuillotine(randomParts(200, 7), [SHEET], OPTIONS);
}

async function timedRun(items: PackItem[]): Promise<{ ms: number; firstProgressMs: number | null; sheets: number; unplaced: number }> {
  const t0 = performance.now();
  let firstProgressMs: number | null = null;
  const onProgress = () => void (firstProgressMs ??= performance.now() - t0);
  const result = await packGuillotine(items, [SHEET], { ...OPTIONS, onProgress });
  return { ms: performance.now() - t0, firstProgressMs, sheets: result.bins.length, unplaced: result.unplaced.length };
}

/** The first run is watched for memory; the rest only timed. */
export async function runScaling(n: number): Promise<ScalingResult> {
  const gc = collector();
  const items = randomParts(n);
  gc();
  const before = process.memoryUsage();
  const maxRssBefore = process.resourceUsage().maxRSS;
  let heapPeak = before.heapUsed;
  let rssPeak = before.rss;
  const sample = () => {
    const m = process.memoryUsage();
    heapPeak = Math.max(heapPeak, m.heapUsed);
    rssPeak = Math.max(rssPeak, m.rss);
  };
  const timer = setInterval(sample, SAMPLE_EVERY_MS);
  const first = await timedRun(items);
  sample();
  clearInterval(timer);
  const maxRssRiseMb = (process.resourceUsage().maxRSS - maxRssBefore) / 1024; // maxRSS is in KiB
  const runs = [first];
  while (n < 10_000 && runs.length < REPEATS) runs.push(await timedRun(items));
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  const progress = runs.map((r) => r.firstProgressMs).filter((x): x is number => x !== null);
  const mb = (bytes: number) => bytes / 2 ** 20;
  return {
    parts: n,
    ms: median(runs.map((r) => r.ms)),
    runs: runs.length,
    firstProgressMs: progress.length ? median(progress) : null,
    sheets: first.sheets,
    unplaced: first.unplaced,
    heapMb: mb(heapPeak - before.heapUsed),
    rssMb: mb(rssPeak - before.rss),
    maxRssRiseMb,
  };
}

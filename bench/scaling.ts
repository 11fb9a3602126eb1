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

export interface ScalingResult {
  parts: number;
  ms: number;
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

export async function runScaling(n: number): Promise<ScalingResult> {
  const gc = collector();
  const items = randomParts(n);
  const bins = [{ id: 0, w: 2420, h: 1200, count: null, cost: 96, priority: 2 }];
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
  const t0 = performance.now();
  const result = await packGuillotine(items, bins, { kerf: 3.2, style: 'panel', objective: 'cost', timeBudgetMs: 0, seed: 1 });
  const ms = performance.now() - t0;
  sample();
  clearInterval(timer);
  const mb = (bytes: number) => bytes / 2 ** 20;
  const maxRssRiseMb = (process.resourceUsage().maxRSS - maxRssBefore) / 1024; // maxRSS is in KiB
  return {
    parts: n,
    ms,
    sheets: result.bins.length,
    unplaced: result.unplaced.length,
    heapMb: mb(heapPeak - before.heapUsed),
    rssMb: mb(rssPeak - before.rss),
    maxRssRiseMb,
  };
}

/**
 * The 500 standard instances (Berkey & Wang classes I–VI, Martello & Vigo classes VII–X): our guillotine packer with
 * kerf 0, one unlimited bin type of the instance's size, objective `pieces`, against the lower bounds; and
 * maxrects-packer (general-purpose, free placement) on the same instances, with how many of its bins cannot be
 * separated by straight through-cuts.
 */
import { dellAmicoMartelloVigo, lowerBound, martelloVigoL2 } from '@/lib/nesting/bounds';
import { maxRectsLayout } from '@/lib/nesting/bounds/maxrects-reference';
import { findGuillotineTree } from '@/lib/nesting/guillotine';
import type { BinPackingInstance } from '@/lib/nesting/instances';
import { packGuillotine } from '@/lib/nesting/pack';
import { checkPackResult } from '@/lib/nesting/pack/result-check';
import type { BinType, PackItem, PackOptions } from '@/lib/nesting/pack/types';

export type Mode = 'fixed' | 'rotation';

export interface InstanceRun {
  name: string;
  cls: number;
  mode: Mode;
  /** `lowerBound`: the strongest valid bound we have. */
  lowerBound: number;
  /** The published bound: Martello & Vigo L2 (fixed) or Dell'Amico, Martello & Vigo (rotation). */
  publishedBound: number;
  bins: number;
  ms: number;
  /** Problems `checkPackResult` found in our result (should be none). */
  problems: string[];
  maxrects?: { bins: number; nonGuillotine: number };
}

export interface ClassSummary {
  cls: number;
  mode: Mode;
  instances: number;
  bins: number;
  lowerBound: number;
  publishedBound: number;
  solvedToBound: number;
  meanMs: number;
  maxMs: number;
  invalid: number;
  maxrectsBins: number | null;
  maxrectsNonGuillotine: number | null;
}

export async function runInstance(inst: BinPackingInstance, mode: Mode, budgetMs: number, withMaxrects: boolean): Promise<InstanceRun> {
  const rotation = mode === 'rotation';
  const items: PackItem[] = inst.items.map((it, id) => ({ id, w: it.w, h: it.h, canRotate: rotation }));
  const bins: BinType[] = [{ id: 0, w: inst.bin.w, h: inst.bin.h, count: null, cost: 1, priority: 1 }];
  const options: PackOptions = { kerf: 0, style: 'panel', objective: 'pieces', timeBudgetMs: budgetMs, seed: 1 };
  const t0 = performance.now();
  const result = await packGuillotine(items, bins, options);
  const ms = performance.now() - t0;
  const problems = checkPackResult(items, bins, options, result);
  if (result.unplaced.length > 0) problems.push(`${result.unplaced.length} item(s) unplaced`);
  // An independent look at our own layouts with the plan layer's checker, beside the packer's own tree.
  const whole = { x: 0, y: 0, w: inst.bin.w, h: inst.bin.h };
  result.bins.forEach((b, k) => {
    if (
      findGuillotineTree(
        whole,
        b.items.map((p) => p.rect),
        0,
      ) === null
    )
      problems.push(`bin ${k} is not guillotine-separable`);
  });

  const run: InstanceRun = {
    name: inst.name,
    cls: inst.cls ?? 0,
    mode,
    lowerBound: lowerBound(inst.items, inst.bin, rotation),
    publishedBound: rotation ? dellAmicoMartelloVigo(inst.items, inst.bin) : martelloVigoL2(inst.items, inst.bin),
    bins: result.bins.length,
    ms,
    problems,
  };
  if (withMaxrects) {
    const layout = maxRectsLayout(inst.items, inst.bin, rotation);
    const nonGuillotine = layout.filter((b) => findGuillotineTree(whole, b.rects, 0) === null).length;
    run.maxrects = { bins: layout.length, nonGuillotine };
  }
  return run;
}

export function summarise(runs: InstanceRun[]): ClassSummary[] {
  const groups = new Map<string, InstanceRun[]>();
  for (const r of runs) {
    const key = `${r.mode}:${r.cls}`;
    groups.set(key, [...(groups.get(key) ?? []), r]);
  }
  return [...groups.values()].map((rs) => {
    const sum = (f: (r: InstanceRun) => number) => rs.reduce((a, r) => a + f(r), 0);
    const withMr = rs.filter((r) => r.maxrects);
    return {
      cls: rs[0].cls,
      mode: rs[0].mode,
      instances: rs.length,
      bins: sum((r) => r.bins),
      lowerBound: sum((r) => r.lowerBound),
      publishedBound: sum((r) => r.publishedBound),
      solvedToBound: rs.filter((r) => r.bins === r.lowerBound).length,
      meanMs: sum((r) => r.ms) / rs.length,
      maxMs: Math.max(...rs.map((r) => r.ms)),
      invalid: rs.filter((r) => r.problems.length > 0).length,
      maxrectsBins: withMr.length ? withMr.reduce((a, r) => a + r.maxrects!.bins, 0) : null,
      maxrectsNonGuillotine: withMr.length ? withMr.reduce((a, r) => a + r.maxrects!.nonGuillotine, 0) : null,
    };
  });
}

/**
 * `npm run bench` — Kerfwise's performance targets live here, never in timed tests.
 * Sections: scaling (first plan and memory at 100 / 1,000 / 10,000 parts), shop (an invented kitchen through
 * `optimize`), standard (the 500 classic instances against lower bounds, beside maxrects-packer).
 * Prints tables and writes the whole run as JSON under bench/results/ (git-ignored). See bench/README.md.
 */
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import path from 'node:path';
import { ZodError } from 'zod';
import { parseInstances } from '@/lib/nesting/instances';
import { CLASS_NAMES, DEFAULT_BUDGET_MS, parseBenchArgs, type BenchArgs } from './args';
import { fixed, table, thousands } from './format';
import { SCALING_SIZES, runScaling, warmUp, type ScalingResult } from './scaling';
import { runShop, type ShopResult } from './shop';
import { runInstance, summarise, type InstanceRun, type Mode } from './standard';

const INSTANCE_FILE = path.resolve(import.meta.dirname, 'data/2bp-classes-I-X.txt');
const RESULTS_DIR = path.resolve(process.cwd(), 'bench/results');

/** Totals the packer should reach on all 500 instances at the default budget (issue 4). */
const TARGET_BINS: Record<Mode, number> = { rotation: 7080, fixed: 7300 };
const SCALING_TARGETS: Record<number, { ms: number; mb?: number }> = { 1_000: { ms: 50 }, 10_000: { ms: 2000, mb: 300 } };

const log = (s = '') => process.stdout.write(`${s}\n`);

async function standardSection(args: BenchArgs) {
  if (!existsSync(INSTANCE_FILE)) throw new Error(`standard instance file not found at ${INSTANCE_FILE}`);
  const all = parseInstances(readFileSync(INSTANCE_FILE, 'utf8'));
  const selected = args.classes.flatMap((c) => all.filter((i) => i.cls === c).slice(0, args.limit));
  const full = selected.length === 500;
  const modes: Mode[] = args.modes === 'both' ? ['fixed', 'rotation'] : [args.modes];
  const runs: InstanceRun[] = [];
  const out: Record<string, unknown> = {};

  for (const mode of modes) {
    const t0 = performance.now();
    for (const [k, inst] of selected.entries()) {
      runs.push(await runInstance(inst, mode, args.budgetMs, args.maxrects));
      if (process.stderr.isTTY && ((k + 1) % 10 === 0 || k + 1 === selected.length))
        process.stderr.write(`\r${mode}: ${k + 1}/${selected.length} instances`);
    }
    if (process.stderr.isTTY) process.stderr.write('\n');
    const summaries = summarise(runs.filter((r) => r.mode === mode));
    const total = (f: (s: (typeof summaries)[number]) => number) => summaries.reduce((a, s) => a + f(s), 0);
    const mine = runs.filter((r) => r.mode === mode);
    const totals = {
      instances: mine.length,
      bins: total((s) => s.bins),
      lowerBound: total((s) => s.lowerBound),
      publishedBound: total((s) => s.publishedBound),
      solvedToBound: total((s) => s.solvedToBound),
      meanMs: mine.reduce((a, r) => a + r.ms, 0) / mine.length,
      maxMs: Math.max(...mine.map((r) => r.ms)),
      invalid: total((s) => s.invalid),
      maxrectsBins: args.maxrects ? total((s) => s.maxrectsBins ?? 0) : null,
      maxrectsNonGuillotine: args.maxrects ? total((s) => s.maxrectsNonGuillotine ?? 0) : null,
      wallSeconds: (performance.now() - t0) / 1000,
    };

    log(
      `\nStandard instances, ${mode === 'rotation' ? 'rotation allowed' : 'fixed orientation'} — guillotine, kerf 0, budget ${args.budgetMs} ms each`,
    );
    type Row = Omit<typeof totals, 'wallSeconds'>;
    const row = (name: string, s: Row) => [
      name,
      s.instances,
      thousands(s.bins),
      thousands(s.lowerBound),
      `${fixed((100 * (s.bins - s.lowerBound)) / s.lowerBound, 2)}%`,
      s.solvedToBound,
      fixed(s.meanMs, 0),
      fixed(s.maxMs, 0),
      s.maxrectsBins === null ? '–' : thousands(s.maxrectsBins),
      s.maxrectsNonGuillotine ?? '–',
      s.invalid,
    ];
    log(
      table(
        ['class', 'inst', 'bins', 'bound', 'gap', 'at bound', 'mean ms', 'max ms', 'maxrects bins', 'not guillotine', 'invalid'],
        [...summaries.map((s) => row(CLASS_NAMES[s.cls - 1], s)), row('total', totals)],
      ),
    );
    const target = TARGET_BINS[mode];
    const verdict = totals.bins <= target ? 'meets' : 'misses';
    log(
      full
        ? `total ${thousands(totals.bins)} bins ${verdict} the target ≤ ${thousands(target)} (sum of lower bounds ${thousands(totals.lowerBound)}; ` +
            `published ${mode === 'rotation' ? "Dell'Amico, Martello & Vigo" : 'Martello & Vigo L2'} ${thousands(totals.publishedBound)})` +
            (args.budgetMs === DEFAULT_BUDGET_MS ? '' : ` — at ${args.budgetMs} ms, not the ${DEFAULT_BUDGET_MS} ms the target assumes`)
        : `subset of ${selected.length} instances: the target ≤ ${thousands(target)} applies to all 500`,
    );
    if (totals.invalid > 0) log(`WARNING: ${totals.invalid} result(s) failed checkPackResult — see the JSON file`);
    out[mode] = { summaries, totals, target: full ? target : null };
  }
  return { instanceFile: INSTANCE_FILE, selected: selected.length, ...out, runs };
}

function printShop(r: ShopResult) {
  log(`\nShop workload — invented kitchen, ${r.parts} parts, 2440 × 1220 sheets, kerf 3.2, trim 10, via optimize`);
  log(
    table(
      ['thickness', 'parts', 'sheets', 'lower bound'],
      r.byThickness.map((t) => [`${t.thickness} mm`, t.parts, t.sheets, t.lowerBound]),
    ),
  );
  log(
    `sheets ${r.sheets}, yield ${fixed(100 * r.yield, 1)}%, material cost ${fixed(r.cost, 2)}, time ${fixed(r.ms, 0)} ms, unplaced ${r.unplaced}, plan violations ${r.violations.length}`,
  );
  for (const v of r.violations.slice(0, 5)) log(`  ${v}`);
}

function printScaling(rs: ScalingResult[]) {
  log(
    '\nScaling — first plan (budget 0) of the packing core after a warm-up, median of 3 runs (1 at 10,000), random cabinet-sized parts, half grain-locked',
  );
  log(
    table(
      ['parts', 'ms', 'first progress ms', 'sheets', 'unplaced', 'heap rise MB', 'rss rise MB', 'peak rss rise MB', 'target'],
      rs.map((r) => {
        const t = SCALING_TARGETS[r.parts];
        const ok = t && r.ms < t.ms && (t.mb === undefined || Math.max(r.rssMb, r.heapMb) < t.mb);
        const target = t ? `< ${t.ms} ms${t.mb ? `, < ${t.mb} MB` : ''}: ${ok ? 'met' : 'MISSED'}` : '–';
        return [
          thousands(r.parts),
          fixed(r.ms, 1),
          r.firstProgressMs === null ? '–' : fixed(r.firstProgressMs, 1),
          r.sheets,
          r.unplaced,
          fixed(r.heapMb, 1),
          fixed(r.rssMb, 1),
          fixed(r.maxRssRiseMb, 1),
          target,
        ];
      }),
    ),
  );
}

async function main() {
  const args = parseBenchArgs(process.argv.slice(2));
  const startedAt = new Date();
  log(
    `Kerfwise bench — ${startedAt.toISOString()}, node ${process.version}, ${cpus().length} cores, load ${loadavg()
      .map((l) => l.toFixed(2))
      .join(' ')}`,
  );
  const results: Record<string, unknown> = {
    startedAt: startedAt.toISOString(),
    args,
    node: process.version,
    cores: cpus().length,
    loadAtStart: loadavg(),
  };

  // Scaling first: its memory figures are cleanest in a fresh process.
  if (args.sections.includes('scaling')) {
    const rs: ScalingResult[] = [];
    await warmUp();
    for (const n of SCALING_SIZES) rs.push(await runScaling(n));
    printScaling(rs);
    results.scaling = rs;
  }
  if (args.sections.includes('shop')) {
    const r = await runShop(args.budgetMs);
    printShop(r);
    results.shop = r;
  }
  if (args.sections.includes('standard')) results.standard = await standardSection(args);

  results.loadAtEnd = loadavg();
  if (args.write) {
    mkdirSync(RESULTS_DIR, { recursive: true });
    const file = path.join(RESULTS_DIR, `bench-${startedAt.toISOString().replace(/[:.]/g, '-')}.json`);
    writeFileSync(file, `${JSON.stringify(results, null, 2)}\n`);
    log(`\nwrote ${path.relative(process.cwd(), file)}`);
  }
}

main().catch((err: unknown) => {
  const flag = (key: PropertyKey | undefined) => (key === undefined ? 'flags' : `--${String(key).replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}`);
  const message =
    err instanceof ZodError ? err.issues.map((i) => `${flag(i.path[0])}: ${i.message}`).join('\n') : String(err instanceof Error ? err.message : err);
  process.stderr.write(`bench: ${message}\n`);
  process.exit(1);
});

/**
 * Quick local check of packing quality on a sample of the standard 2D bin packing instances (not the benchmark:
 * `npm run bench` is). Usage: `npx tsx lib/nesting/pack/dev-bench.ts <ms per instance> <every k-th> <rot|fixed> [style]`;
 * `PK_ITERS=n` counts iterations instead of time (repeatable), `PK_CLASSES=3,7` picks classes.
 */
import { readFileSync } from 'node:fs';
import { parseInstances } from '@/lib/nesting/instances';
import { lowerBound } from '@/lib/nesting/bounds';
import { packWithLimits } from './index';

const [ms = '100', every = '5', mode = 'rot', style = 'panel'] = process.argv.slice(2);
const rotation = mode === 'rot';
const instances = parseInstances(readFileSync(new URL('../../../bench/data/2bp-classes-I-X.txt', import.meta.url), 'utf8'));
const perClass = new Map<number, { bins: number; lb: number; first: number }>();
let total = 0;
let totalLb = 0;
let totalFirst = 0;
const t0 = performance.now();
for (let k = 0; k < instances.length; k += Number(every)) {
  const inst = instances[k];
  if (process.env.PK_CLASSES && !process.env.PK_CLASSES.split(',').includes(String(inst.cls))) continue;
  const items = inst.items.map((it, id) => ({ id, w: it.w, h: it.h, canRotate: rotation }));
  const bin = { id: 0, w: inst.bin.w, h: inst.bin.h, count: null, cost: 1, priority: 1 };
  let first = -1;
  const iterations = process.env.PK_ITERS ? Number(process.env.PK_ITERS) : undefined;
  const r = await packWithLimits(
    items,
    [bin],
    {
      kerf: 0,
      style: style as 'panel',
      objective: 'pieces',
      timeBudgetMs: Number(ms),
      seed: 1,
      onProgress: (p) => {
        if (first < 0) first = p.binsUsed;
      },
    },
    { maxIterations: iterations },
  );
  const lb = lowerBound(inst.items, inst.bin, rotation);
  const c = perClass.get(inst.cls!) ?? { bins: 0, lb: 0, first: 0 };
  c.bins += r.bins.length;
  c.lb += lb;
  c.first += first < 0 ? r.bins.length : first;
  perClass.set(inst.cls!, c);
  total += r.bins.length;
  totalLb += lb;
  totalFirst += first < 0 ? r.bins.length : first;
}
for (const [cls, c] of [...perClass].sort((a, b) => a[0] - b[0])) console.log(`class ${cls}: ${c.bins} (lb ${c.lb}, first ${c.first})`);
console.log(`total ${total} (lb ${totalLb}, first ${totalFirst}) in ${((performance.now() - t0) / 1000).toFixed(1)} s`);

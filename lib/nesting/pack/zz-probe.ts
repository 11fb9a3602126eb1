import { readFileSync } from 'node:fs';
import { parseInstances } from '@/lib/nesting/instances';
import { packWithLimits } from './index';
const inst = parseInstances(readFileSync('/work/shared/bench/2bp-classes-I-X.txt', 'utf8')).filter(i => i.name.startsWith(process.argv[2] ?? 'cl07_100'));
for (const it of inst.slice(0, 3)) {
  const items = it.items.map((x, id) => ({ id, ...x, canRotate: false }));
  for (const iters of [0, 100, 1000, 5000]) {
    const t = performance.now();
    const r = await packWithLimits(items, [{ id: 0, w: it.bin.w, h: it.bin.h, count: null, cost: 1, priority: 1 }], { kerf: 0, style: 'panel', objective: 'pieces', timeBudgetMs: 1e9, seed: 1 }, { maxIterations: iters });
    console.log(it.name, iters, r.bins.length, (performance.now() - t).toFixed(0) + 'ms');
  }
}

import { packWithLimits } from './index';
import { mulberry32 } from './prng';
for (const n of [1000, 1000, 1000, 10000, 10000]) {
  const rng = mulberry32(n);
  const items = Array.from({ length: n }, (_, id) => ({ id, w: 50 + Math.floor(rng() * 700), h: 40 + Math.floor(rng() * 500), canRotate: rng() < 0.7 }));
  for (const style of ['panel', 'strips'] as const) {
    const t = performance.now();
    let first = -1;
    const r = await packWithLimits(items, [{ id: 0, w: 2440, h: 1220, count: null, cost: 1, priority: 1 }], { kerf: 3.2, style, objective: 'cost', timeBudgetMs: 0, seed: 1, onProgress: () => { if (first < 0) first = performance.now() - t; } }, {});
    console.log(n, style, r.bins.length, 'first', first.toFixed(0), 'total', (performance.now() - t).toFixed(0) + 'ms');
  }
}

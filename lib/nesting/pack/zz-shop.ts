import { packWithLimits } from './index';
import { mulberry32 } from './prng';
const rng = mulberry32(5);
const items = Array.from({ length: 60 }, (_, id) => ({ id, w: 200 + Math.floor(rng() * 600), h: 100 + Math.floor(rng() * 500), canRotate: rng() < 0.5 }));
const bins = [
  { id: 1, w: 2440, h: 1220, count: null, cost: 60, priority: 2 },
  { id: 2, w: 2800, h: 2070, count: null, cost: 95, priority: 2 },
  { id: 3, w: 900, h: 700, count: 2, cost: 0, priority: 0 },
  { id: 4, w: 2440, h: 1220, count: 2, cost: 60, priority: 1 },
];
for (const objective of ['cost', 'pieces', 'cuts'] as const) for (const style of ['panel', 'strips'] as const) for (const iters of [0, 300, 3000]) {
  const t = performance.now();
  const r = await packWithLimits(items, bins, { kerf: 3.2, style, objective, timeBudgetMs: 1e9, seed: 1 }, { maxIterations: iters });
  const cost = r.bins.reduce((s, b) => s + bins.find((x) => x.id === b.binTypeId)!.cost, 0);
  let cuts = 0; const count = (n: any): void => { if (n.type === 'cut') { cuts++; n.children.forEach(count); } }; r.bins.forEach((b) => count(b.tree));
  console.log(objective, style, iters, 'bins', r.bins.map((b) => b.binTypeId).join(','), 'cost', cost, 'cuts', cuts, (performance.now() - t).toFixed(0) + 'ms');
}

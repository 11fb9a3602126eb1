import { packWithLimits } from './index';
import { mulberry32 } from './prng';
for (const seed of [1, 2, 3]) {
const rng = mulberry32(seed);
const items = Array.from({ length: 200 }, (_, id) => ({ id, w: 150 + Math.floor(rng() * 700), h: 100 + Math.floor(rng() * 500), canRotate: rng() < 0.5 }));
const one = [{ id: 1, w: 2440, h: 1220, count: null, cost: 60, priority: 2 }];
const mixed = [...one, { id: 3, w: 900, h: 700, count: 2, cost: 0, priority: 0 }, { id: 4, w: 1200, h: 600, count: 1, cost: 0, priority: 0 }];
for (const bins of [one, mixed]) for (const ms of [0, 2000]) {
  const r = await packWithLimits(items, bins, { kerf: 3.2, style: 'panel', objective: 'cost', timeBudgetMs: ms, seed: 1 }, ms === 0 ? { maxIterations: 0 } : {});
  const cost = r.bins.reduce((s, b) => s + bins.find((x) => x.id === b.binTypeId)!.cost, 0);
  const area = items.reduce((s, i) => s + i.w * i.h, 0);
  console.log(seed, bins.length, ms, 'bins', r.bins.length, 'cost', cost, 'L0', Math.ceil(area / (2440 * 1220)));
}
}

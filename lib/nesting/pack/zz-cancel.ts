import { packGuillotine } from './index';
import { mulberry32 } from './prng';
for (const n of [300, 3000, 10000]) {
  const rng = mulberry32(n);
  const items = Array.from({ length: n }, (_, id) => ({ id, w: 50 + Math.floor(rng() * 700), h: 40 + Math.floor(rng() * 500), canRotate: rng() < 0.7 }));
  for (const style of ['panel', 'strips'] as const) {
    const ac = new AbortController();
    let abortedAt = 0;
    const t = performance.now();
    const stamps: number[] = [];
    setTimeout(() => { abortedAt = performance.now(); ac.abort(); }, 1000);
    const r = await packGuillotine(items, [{ id: 0, w: 2440, h: 1220, count: null, cost: 1, priority: 1 }, { id: 1, w: 1220, h: 1220, count: 3, cost: 0, priority: 0 }], { kerf: 3.2, style, objective: 'cost', timeBudgetMs: 10000, seed: 1, signal: ac.signal, onProgress: () => stamps.push(performance.now() - t) });
    const gaps = stamps.slice(1).map((s, i) => s - stamps[i]);
    console.log(n, style, r.bins.length, 'stop after abort', (performance.now() - abortedAt).toFixed(0), 'ms; progress count', stamps.length, 'max gap', Math.max(...gaps).toFixed(0), 'first', stamps[0].toFixed(0));
  }
}

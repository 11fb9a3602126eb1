import { describe, expect, test } from 'vitest';
import { createNestingWorkerApi } from '@/lib/nesting/worker-handler';
import { PROGRESS_INTERVAL_MS, type NestProgress } from '@/lib/nesting/worker-api';
import { validatePlan } from '@/lib/nesting/validate-plan';
import { part, request, sheet } from '@/lib/nesting/test-support';

/** Odd sizes that leave the search something to improve, so it runs until its budget or a cancel. */
const busy = (timeBudgetMs: number) =>
  request(
    Array.from({ length: 12 }, (_, i) => part(`p${i}`, 237 + 61 * i, 113 + 37 * ((i * 5) % 11), { quantity: 3, grain: 'any' })),
    [sheet('S', 2440, 1220)],
    { timeBudgetMs, kerf: 3.2 },
  );

describe('nesting worker API', () => {
  test('refuses a bad request at the boundary, naming the field', async () => {
    const api = createNestingWorkerApi();
    const out = await api.optimize({ parts: [{ id: 'p', quantity: 0 }], stock: [] });
    expect(out.ok).toBe(false);
    if (out.ok || out.error !== 'invalid-request') throw new Error('expected invalid-request');
    expect(out.issues.map((i) => i.path)).toEqual(expect.arrayContaining(['parts.0.quantity', 'parts.0.length']));
  });

  test('nests a valid request into a valid plan', async () => {
    const api = createNestingWorkerApi();
    const req = request([part('p', 500, 400, { quantity: 4 })], [sheet('S', 2440, 1220)]);
    const out = await api.optimize(req);
    if (!out.ok) throw new Error('expected a plan');
    expect(validatePlan(req, out.plan)).toEqual([]);
    expect(out.plan.pieces).toHaveLength(1);
  });

  test('cancel makes the running search resolve with its best plan so far, every part accounted for', async () => {
    const api = createNestingWorkerApi();
    const req = busy(60_000);
    const progress: NestProgress[] = [];
    const run = api.optimize(req, (p) => {
      progress.push(p);
      api.cancel();
    });
    const out = await run;
    if (!out.ok) throw new Error('expected a plan');
    expect(out.plan.cancelled).toBe(true);
    expect(validatePlan(req, out.plan)).toEqual([]);
    expect(progress.length).toBeGreaterThan(0);
  });

  test('progress carries elapsed time, pieces, yield and cost, spaced at least the interval apart', async () => {
    const api = createNestingWorkerApi();
    const progress: NestProgress[] = [];
    const out = await api.optimize(busy(700), (p) => void progress.push(p));
    expect(out.ok).toBe(true);
    expect(progress.length).toBeGreaterThanOrEqual(2);
    // Heartbeats before the first plan carry zeros; once there is a plan, its figures.
    const withPlan = progress.filter((p) => p.piecesUsed > 0);
    expect(withPlan.length).toBeGreaterThan(0);
    for (const p of withPlan) {
      expect(p.yield).toBeGreaterThan(0);
      expect(p.yield).toBeLessThanOrEqual(1);
      expect(p.cost).toBe(p.piecesUsed * 60);
    }
    for (let i = 1; i < progress.length; i++) {
      expect(progress[i].elapsedMs - progress[i - 1].elapsedMs).toBeGreaterThanOrEqual(PROGRESS_INTERVAL_MS - 1e-6);
    }
  });

  test('a run without a progress listener sends nothing and still returns its plan', async () => {
    const api = createNestingWorkerApi();
    const out = await api.optimize(busy(0));
    expect(out.ok && out.plan.pieces.length).toBeGreaterThan(0);
  });

  test('starting a new run cancels the one still running', async () => {
    const api = createNestingWorkerApi();
    const first = api.optimize(busy(60_000));
    const second = api.optimize(busy(0));
    const [a, b] = await Promise.all([first, second]);
    expect(a.ok && a.plan.cancelled).toBe(true);
    expect(b.ok && b.plan.cancelled).toBe(false);
  });
});

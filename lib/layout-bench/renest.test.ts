import { describe, expect, test } from 'vitest';
import { optimize, rebuildCuts, validatePlan } from '@/lib/nesting';
import { part, request, sheet } from '@/lib/nesting/test-support';
import { nestRequestSchema, planSchema } from '@/shared/schemas/nesting';
import { docToPlan, planToDoc } from '@/lib/layout-bench/document';
import { prepareRenest } from '@/lib/layout-bench/renest';

// An invented cabinet run: sides, shelves and backs on 2440 × 1220 birch ply, kerf 3.2, trim 5 (common practice, no source).
const req = nestRequestSchema.parse(
  request(
    [part('side', 720, 560, { quantity: 4 }), part('shelf', 764, 540, { quantity: 6, grain: 'any' }), part('back', 764, 700, { quantity: 2 })],
    [sheet('ply', 2440, 1220, { count: 3 }), sheet('buy-ply', 2440, 1220)],
    { kerf: 3.2, trim: 5 },
  ),
);

describe('re-nesting the unlocked parts around the locked ones', () => {
  test('a plan turned into a bench document and back is the same plan, placement for placement', async () => {
    const plan = await optimize(req);
    const back = docToPlan(planToDoc(plan, req));
    expect(back.pieces.map((p) => p.placements.length)).toEqual(plan.pieces.map((p) => p.placements.length));
    expect(validatePlan(req, back)).toEqual([]);
  });

  test('locks travel with the plan: saved through rebuildCuts and the plan schema, and read back locked', async () => {
    const plan = await optimize(req);
    const doc = planToDoc(plan, req);
    const lockedKeys = Object.keys(doc.placements).filter((_, i) => i % 4 === 0);
    for (const k of lockedKeys) doc.placements[k] = { ...doc.placements[k], locked: true };
    const saved = planSchema.parse(rebuildCuts(req, docToPlan(doc)));
    expect(validatePlan(req, saved)).toEqual([]);
    const reread = planToDoc(saved, req);
    expect(
      Object.keys(reread.placements)
        .filter((k) => reread.placements[k].locked)
        .sort(),
    ).toEqual([...lockedKeys].sort());
  });

  test('locked parts stay exactly where they were, every part is placed or reported once, and the plan is valid', async () => {
    const plan = await optimize(req);
    const doc = planToDoc(plan, req);
    const lockedKeys = Object.keys(doc.placements).filter((_, i) => i % 3 === 0);
    for (const k of lockedKeys) doc.placements[k] = { ...doc.placements[k], locked: true };
    const job = prepareRenest(req, doc);
    expect(job.request.parts.reduce((n, p) => n + p.quantity, 0)).toBe(Object.keys(doc.placements).length - lockedKeys.length);
    const merged = job.merge(await optimize(job.request));
    for (const k of lockedKeys) {
      const [was, now] = [doc.placements[k], merged.placements[k]];
      expect({ x: now.x, y: now.y, w: now.w, h: now.h, stock: merged.pieces[now.piece].stockId }).toEqual({
        x: was.x,
        y: was.y,
        w: was.w,
        h: was.h,
        stock: doc.pieces[was.piece].stockId,
      });
    }
    expect(Object.keys(merged.placements).length + merged.unplaced.length).toBe(12);
    expect(validatePlan(req, docToPlan(merged))).toEqual([]);
  });

  test('with nothing locked the whole job is nested afresh', async () => {
    const doc = planToDoc(await optimize(req), req);
    const job = prepareRenest(req, doc);
    expect(job.request.stock.map((s) => s.id)).toEqual(['ply', 'buy-ply']);
    const merged = job.merge(await optimize(job.request));
    expect(validatePlan(req, docToPlan(merged))).toEqual([]);
  });
});

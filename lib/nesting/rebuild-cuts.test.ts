import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { rebuildCuts } from '@/lib/nesting/rebuild-cuts';
import { optimize } from '@/lib/nesting/optimize';
import { validatePlan } from '@/lib/nesting/validate-plan';
import { at, handPlan, part, request, requestArb, sheet } from '@/lib/nesting/test-support';

describe('rebuildCuts', () => {
  test('an optimized plan stripped to its placements gets a valid tree and saw order back', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb, async (req) => {
        const plan = await optimize(req);
        const bare = {
          ...plan,
          pieces: plan.pieces.map(({ stockId, kind, length, width, thickness, material, trim, placements }) => ({
            stockId,
            kind,
            length,
            width,
            thickness,
            material,
            trim,
            placements,
          })),
        };
        expect(validatePlan(req, bare)).toEqual([]);
        const rebuilt = rebuildCuts(req, bare);
        expect(validatePlan(req, rebuilt)).toEqual([]);
        expect(rebuilt.pieces.every((p) => p.sawOrder && p.figures)).toBe(true);
        expect(rebuilt.totals!.partArea).toBeCloseTo(plan.totals!.partArea, 6);
      }),
      { numRuns: 25 },
    );
  });

  test('a part dragged 1 mm off the edge (less than a kerf) is shaved free from the far edge', () => {
    const req = request([part('p', 500, 400)], [sheet('S', 1000, 500)], { kerf: 3 });
    const plan = handPlan(req, 'S', [at('p', 1, 0, 500, 400)]);
    expect(validatePlan(req, plan)).toEqual([]);
    const shave = plan.pieces[0].sawOrder!.find((s) => s.reference === 'high' && s.kind === 'crosscut')!;
    // The piece rides the fence by its far edge: blade on the 1 mm sliver, the part side between blade and fence.
    expect(shave.produces).toHaveLength(1);
    expect(shave.produces[0]).toMatchObject({ x: 1, parts: [{ partId: 'p', instance: 1 }] });
  });

  test('a layout that cannot be cut keeps its placements and loses its saw order', () => {
    const req = request([part('a', 600, 300), part('b', 600, 300)], [sheet('S', 1000, 500)], { kerf: 3 });
    const plan = handPlan(req, 'S', [at('a', 0, 0, 600, 300), at('b', 300, 100, 600, 300)]);
    expect(plan.pieces[0].placements).toHaveLength(2);
    expect(plan.pieces[0].sawOrder).toBeUndefined();
    expect(validatePlan(req, plan).map((v) => v.code)).toContain('overlap');
  });
});

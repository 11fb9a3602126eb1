import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { optimize } from '@/lib/nesting';
import { requestArb } from '@/lib/nesting/test-support';
import { contains } from '@/lib/geometry/rect';
import { inches } from '@/lib/units/length';
import { nestRequestSchema, type Plan } from '@/shared/schemas/nesting';
import { sawOrderGeometry, segmentLength, type Segment } from './step-geometry';
import { carcassRequest, nest, stripsRequest } from './test-plans';

const EPS = 1e-6;
const onRect = (s: Segment, r: { x: number; y: number; w: number; h: number }) =>
  [s.x1, s.x2].every((x) => x >= r.x - EPS && x <= r.x + r.w + EPS) && [s.y1, s.y2].every((y) => y >= r.y - EPS && y <= r.y + r.h + EPS);

/** The checks every step of every piece must pass. */
function expectGeometryMatchesPlan(plan: Plan, kerf: number) {
  plan.pieces.forEach((piece, i) => {
    const geometry = sawOrderGeometry(piece, i, kerf);
    expect(geometry).toHaveLength(piece.sawOrder?.length ?? 0);
    for (const g of geometry) {
      // The highlighted line lies on the piece being cut, runs the right way, and spans it (a through-cut).
      expect(onRect(g.line, g.piece)).toBe(true);
      if (g.step.kind === 'rip') expect(g.line.y1).toBeCloseTo(g.line.y2, 9);
      else expect(g.line.x1).toBeCloseTo(g.line.x2, 9);
      expect(segmentLength(g.line)).toBeCloseTo(g.step.length, 6);
      // The fence dimension drawn is the plan's fence number, measured from the edge on the fence.
      expect(segmentLength(g.fenceDimension)).toBeCloseTo(g.step.fence, 6);
      expect(onRect(g.fenceEdge, g.piece)).toBe(true);
      expect(contains(g.piece, g.kerf, EPS)).toBe(true);
      expect(g.kerf.w * g.kerf.h).toBeGreaterThanOrEqual(0);
      // What the cut leaves lies inside the piece and clear of the blade.
      for (const p of g.produces) {
        expect(contains(g.piece, p, EPS)).toBe(true);
        const clear =
          p.x + p.w <= g.kerf.x + EPS || g.kerf.x + g.kerf.w <= p.x + EPS || p.y + p.h <= g.kerf.y + EPS || g.kerf.y + g.kerf.h <= p.y + EPS;
        expect(clear).toBe(true);
      }
    }
  });
}

describe('saw-order diagram geometry', () => {
  test('strips of 11-7/8″ on a 48″ sheet with a 1/8″ kerf are four rips, each fence 11-7/8″ from the same edge (strip count, derived)', async () => {
    const { plan } = await nest(stripsRequest());
    const geometry = sawOrderGeometry(plan.pieces[0], 0, inches(1 / 8));
    expect(geometry.map((g) => g.step.kind)).toEqual(['rip', 'rip', 'rip', 'rip']);
    for (const g of geometry) expect(segmentLength(g.fenceDimension)).toBeCloseTo(inches(11 + 7 / 8), 9);
    // Each rip's blade sits one strip and one kerf further along the sheet's width than the last.
    geometry.forEach((g, k) => expect(g.kerf.y).toBeCloseTo(k * inches(12) + inches(11 + 7 / 8), 9));
    expectGeometryMatchesPlan(plan, inches(1 / 8));
  });

  test('a trimmed carcass plan: every highlighted line is on its piece and every fence number equals the plan’s', async () => {
    const { plan } = await nest(carcassRequest());
    expect(plan.pieces.flatMap((p) => p.sawOrder ?? []).some((s) => s.trim)).toBe(true);
    expectGeometryMatchesPlan(plan, inches(1 / 8));
  });

  test('for any nested plan, the geometry agrees with the saw order step by step', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb, async (input) => {
        const req = nestRequestSchema.parse(input);
        const plan = await optimize(req);
        expectGeometryMatchesPlan(plan, req.settings.kerf);
      }),
      { numRuns: 25 },
    );
  });

  test('a step naming a piece that is not there is refused, not drawn somewhere', async () => {
    const { plan } = await nest(stripsRequest());
    const piece = { ...plan.pieces[0], sawOrder: plan.pieces[0].sawOrder!.map((s, i) => (i === 1 ? { ...s, piece: 'Z9' } : s)) };
    expect(() => sawOrderGeometry(piece, 0, inches(1 / 8))).toThrow(/Z9/);
  });
});

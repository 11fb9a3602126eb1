import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import type { DrawerScheduleInput } from '@/shared/schemas/drawer-schedule';
import { sizeDrawerSchedule } from '@/lib/joinery/size-drawer-schedule';
import type { DrawerPart, DrawerPartRole } from '@/lib/joinery/types';

const EPS = 1e-6;
const len = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });

interface Thickness {
  front: number;
  back: number;
  side: number;
}

/** Valid joint parameters for the stock, and the engagement each joint makes, in the trade's words. */
const jointFor = (t: Thickness) => {
  const panel = Math.min(t.front, t.back);
  return fc.oneof(
    len(0.5, panel - 0.5).map((faceLeft) => ({ method: 'lock-rabbet' as const, faceLeft })),
    fc.record({ method: fc.constant('rabbet-and-dado' as const), dadoDepth: len(0.5, t.side - 0.5), dadoWidth: len(1, panel - 0.5) }),
    fc.record({
      method: fc.constant('butt-pocket-screw' as const),
      layout: fc.constantFrom('sides-full-depth' as const, 'front-back-full-width' as const),
    }),
    fc.record({
      method: fc.constant('butt-loose-tenon' as const),
      layout: fc.constantFrom('sides-full-depth' as const, 'front-back-full-width' as const),
      tenonThickness: len(1, Math.min(t.side, panel) - 0.5),
      mortiseDepth: len(1, Math.min(t.side, panel) - 0.5),
    }),
    len(0.5, t.front - 0.5).map((lap) => ({ method: 'half-blind-dovetail' as const, lap })),
    fc.constant({ method: 'through-dovetail' as const }),
    len(3, 20).map((fingerWidth) => ({ method: 'box-joint' as const, fingerWidth })),
  );
};
type GenJoint = ReturnType<typeof jointFor> extends fc.Arbitrary<infer J> ? J : never;

/**
 * How deep each part's end goes into its mate, written from how the joint is cut, not from the sizing code:
 * `side` = into the front/back thickness, `panel` = into the side thickness.
 */
function tradeEngagement(joint: GenJoint, t: Thickness, end: 'front' | 'back'): { side: number; panel: number } {
  const tp = end === 'front' ? t.front : t.back;
  switch (joint.method) {
    case 'lock-rabbet': // front/back cover the side's end; the side's tongue stops faceLeft short of their face
      return { side: tp - joint.faceLeft, panel: t.side };
    case 'rabbet-and-dado': // sides run through; the front's tongue sits in a dado dadoDepth deep
      return { side: tp, panel: joint.dadoDepth };
    case 'butt-pocket-screw':
    case 'butt-loose-tenon': // one part's end grain meets the other's face
      return joint.layout === 'sides-full-depth' ? { side: tp, panel: 0 } : { side: 0, panel: t.side };
    case 'half-blind-dovetail': // tails stop at the lap at the front, run through at the back
      return end === 'front' ? { side: tp - joint.lap, panel: t.side } : { side: tp, panel: t.side };
    case 'through-dovetail':
    case 'box-joint':
      return { side: tp, panel: t.side };
  }
}

const allowsLip = (j: GenJoint) =>
  j.method === 'lock-rabbet' ||
  j.method === 'half-blind-dovetail' ||
  ((j.method === 'butt-pocket-screw' || j.method === 'butt-loose-tenon') && j.layout === 'front-back-full-width');

const scheduleArb = fc
  .record({ front: len(9, 32), back: len(9, 32), side: len(6, 25) })
  .chain((t) =>
    fc.record({
      t: fc.constant(t),
      joint: jointFor(t),
      box: fc.record({ width: len(150, 1200), height: len(60, 400), depth: len(150, 900) }),
      quantity: fc.integer({ min: 1, max: 50 }),
      lip: fc.option(len(1, 30), { nil: undefined }),
      bottom: fc.oneof(
        fc
          .record({
            width: len(3, 12),
            depth: len(1, Math.min(t.front, t.back, t.side) - 0.5),
            height: len(0, 30),
            clearanceFraction: fc.double({ min: 0, max: 0.95, noNaN: true }),
            bottomFraction: fc.double({ min: 0.3, max: 1, noNaN: true }),
          })
          .map((g) => ({
            mount: 'groove' as const,
            thickness: g.width * g.bottomFraction,
            groove: { width: g.width, depth: g.depth, height: g.height, clearance: 2 * g.depth * g.clearanceFraction },
          })),
        len(3, 19).map((thickness) => ({ mount: 'applied' as const, thickness })),
      ),
    }),
  )
  .map(({ t, joint, box, quantity, lip, bottom }) => ({
    t,
    joint,
    box,
    bottom,
    lip: lip !== undefined && allowsLip(joint) ? lip : 0,
    input: {
      label: 'Prop',
      quantity,
      size: { from: 'box', ...box },
      thickness: { front: t.front, back: t.back, side: t.side },
      joint,
      front: lip !== undefined && allowsLip(joint) ? { style: 'lipped', lip: lip } : { style: 'flush' },
      bottom,
    } satisfies DrawerScheduleInput,
  }));

const byRole = (parts: DrawerPart[], role: DrawerPartRole) => parts.find((p) => p.role === role)!;

describe('drawer box properties', () => {
  test('for every valid schedule the parts, assembled by their joints, close the box asked for on every axis', () => {
    fc.assert(
      fc.property(scheduleArb, ({ t, joint, box, lip, bottom, input }) => {
        const result = sizeDrawerSchedule(input);
        expect(result.ok).toBe(true);
        if (!result.ok) return;
        const front = byRole(result.parts, 'front');
        const back = byRole(result.parts, 'back');
        const side = byRole(result.parts, 'side');

        // Each end engages its mate as the joint is cut, and every corner is closed: one of the two parts reaches
        // the outside face, and neither enters more than the other is thick.
        for (const end of ['front', 'back'] as const) {
          const want = tradeEngagement(joint, t, end);
          const panel = end === 'front' ? front : back;
          const sideEnd = side.endEngagement[end === 'front' ? 0 : 1];
          expect(sideEnd).toBeCloseTo(want.side, 6);
          expect(panel.endEngagement[0]).toBeCloseTo(want.panel, 6);
          expect(panel.endEngagement[1]).toBeCloseTo(want.panel, 6);
          const tp = end === 'front' ? t.front : t.back;
          expect(sideEnd >= tp - EPS || panel.endEngagement[0] >= t.side - EPS).toBe(true);
          expect(sideEnd).toBeLessThanOrEqual(tp + EPS);
          expect(panel.endEngagement[0]).toBeLessThanOrEqual(t.side + EPS);
        }

        // Plan view, x across, y from the front face back. Left side at x ∈ [0, tₛ]; the front's end enters it.
        const frontStartX = t.side - front.endEngagement[0] - front.overhang;
        const frontEndX = frontStartX + front.length;
        const rightInsideX = frontEndX - front.overhang - front.endEngagement[1];
        const backStartX = t.side - back.endEngagement[0];
        const backEndX = backStartX + back.length;
        expect(backEndX - back.endEngagement[1]).toBeCloseTo(rightInsideX, 6); // the back fits the same sides
        const sideStartY = t.front - side.endEngagement[0];
        const sideEndY = sideStartY + side.length;
        const backInsideY = sideEndY - side.endEngagement[1];

        const xs = [0, rightInsideX + t.side, backStartX, backEndX, frontStartX + front.overhang, frontEndX - front.overhang];
        const ys = [0, t.front, sideStartY, sideEndY, backInsideY, backInsideY + t.back];
        const wallHeights = new Set([front.width, back.width, side.width].map((h) => h.toFixed(6)));
        const bottomPart = byRole(result.parts, 'bottom');
        const height = front.width + (bottom.mount === 'applied' ? bottomPart.thickness : 0);

        expect(Math.max(...xs) - Math.min(...xs)).toBeCloseTo(box.width, 6);
        expect(Math.max(...ys) - Math.min(...ys)).toBeCloseTo(box.depth, 6);
        expect(wallHeights.size).toBe(1);
        expect(height).toBeCloseTo(box.height, 6);
        expect(front.overhang).toBeCloseTo(lip, 9);

        // The bottom spans groove bottom to groove bottom less the clearance asked for, both ways.
        if (bottom.mount === 'groove') {
          const g = bottom.groove;
          const acrossGrooves = rightInsideX + g.depth - (t.side - g.depth);
          const frontToBack = backInsideY + g.depth - (t.front - g.depth);
          expect(acrossGrooves - bottomPart.length).toBeCloseTo(g.clearance, 6);
          expect(frontToBack - bottomPart.width).toBeCloseTo(g.clearance, 6);
          expect(bottomPart.thickness).toBeLessThanOrEqual(g.width + EPS);
        } else {
          expect(bottomPart.length).toBeCloseTo(box.width, 6);
          expect(bottomPart.width).toBeCloseTo(box.depth, 6);
        }
      }),
      { numRuns: 300 },
    );
  });

  test('every part count is the per-box count times the boxes, and no part is dropped', () => {
    fc.assert(
      fc.property(scheduleArb, ({ input }) => {
        const result = sizeDrawerSchedule(input);
        if (!result.ok) throw new Error('valid schedule refused');
        expect(result.parts.map((p) => p.role).sort()).toEqual(['back', 'bottom', 'front', 'side']);
        for (const p of result.parts) {
          expect(p.quantity).toBe(p.quantityPerBox * input.quantity);
          expect(p.length).toBeGreaterThan(0);
          expect(p.width).toBeGreaterThan(0);
        }
      }),
      { numRuns: 100 },
    );
  });

  const breakages = fc.constantFrom(
    'engagement-through-front',
    'engagement-through-side',
    'bottom-thicker-than-groove',
    'negative-clearance',
    'box-narrower-than-sides',
    'negative-thickness',
    'fractional-quantity',
  );

  test('an invalid schedule gives field errors and never parts', () => {
    fc.assert(
      fc.property(scheduleArb, breakages, len(0, 20), ({ t, input }, breakage, extra) => {
        const broken: Record<string, unknown> = structuredClone(input);
        switch (breakage) {
          case 'engagement-through-front':
            broken.joint = { method: 'half-blind-dovetail', lap: t.front + extra };
            break;
          case 'engagement-through-side':
            broken.joint = { method: 'rabbet-and-dado', dadoDepth: t.side + extra };
            break;
          case 'bottom-thicker-than-groove':
            broken.bottom = { mount: 'groove', thickness: 6 + extra + 0.01, groove: { width: 6 } };
            break;
          case 'negative-clearance':
            broken.bottom = { mount: 'groove', groove: { clearance: -(extra + 0.01) } };
            break;
          case 'box-narrower-than-sides':
            broken.size = { ...input.size, width: 2 * t.side * (extra / 21) };
            break;
          case 'negative-thickness':
            broken.thickness = { ...input.thickness, side: -extra };
            break;
          case 'fractional-quantity':
            broken.quantity = input.quantity + 0.5;
            break;
        }
        const result = sizeDrawerSchedule(broken);
        expect(result.ok).toBe(false);
        expect(result).not.toHaveProperty('parts');
        if (result.ok) return;
        expect(result.errors.length).toBeGreaterThan(0);
        for (const e of result.errors) {
          expect(e.path).not.toBe('');
          expect(e.message.length).toBeGreaterThan(10);
        }
      }),
      { numRuns: 200 },
    );
  });
});

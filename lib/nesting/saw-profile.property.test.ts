import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { optimize } from '@/lib/nesting/optimize';
import { validatePlan } from '@/lib/nesting/validate-plan';
import { requestArb } from '@/lib/nesting/test-support';
import type { NestRequestInput } from '@/shared/schemas/nesting';
import type { NestSaw } from '@/shared/schemas/saw';

const base = {
  kindName: null,
  maxPieceLength: null,
  maxPieceWidth: null,
} as const;

/**
 * A second saw: any stage limit (2, 3, 4 or any), either first direction, any safe minimum. Alone,
 * it takes the whole stock (the arbitrary's largest sheet is 2440 × 1220); beside a breakdown track saw whose track is
 * longer than any stock, its capacities may be anything, since the track saw makes what it cannot.
 */
const secondSaw = (alone: boolean): fc.Arbitrary<NestSaw> =>
  fc
    .record({
      maxStages: fc.constantFrom(2 as const, 3 as const, 4 as const, null),
      firstStage: fc.constantFrom('rip' as const, 'crosscut' as const),
      minFenceWidth: fc.constantFrom(0, 25.4),
      rip: alone ? fc.constant(null) : fc.option(fc.integer({ min: 100, max: 1300 }), { nil: null }),
      cross: alone ? fc.option(fc.integer({ min: 1220, max: 3000 }), { nil: null }) : fc.option(fc.integer({ min: 200, max: 3000 }), { nil: null }),
      piece: alone ? fc.constant(null) : fc.option(fc.integer({ min: 400, max: 2440 }), { nil: null }),
    })
    .map((s) => ({
      ...base,
      kind: 'table-saw',
      name: 'Table saw',
      kerf: 3.2,
      ripCapacity: s.rip,
      crosscutCapacity: s.cross,
      maxPieceLength: s.piece,
      maxPieceWidth: s.piece === null ? null : Math.min(s.piece, 1220),
      maxStages: s.maxStages,
      firstStage: s.firstStage,
      minFenceWidth: s.minFenceWidth,
    }));

const trackSaw: NestSaw = {
  ...base,
  kind: 'track-saw',
  name: 'Track saw',
  kerf: 2.4,
  ripCapacity: null,
  crosscutCapacity: 2800,
  maxStages: null,
  firstStage: 'rip',
  minFenceWidth: 0,
};

const withSaws = fc.tuple(requestArb, fc.boolean()).chain(([req, breakdown]) =>
  secondSaw(!breakdown).map(
    (saw): NestRequestInput => ({
      ...req,
      settings: { ...req.settings, kerf: 3.2, saw, ...(breakdown ? { breakdownSaw: trackSaw } : {}) },
    }),
  ),
);

describe('the engine keeps to the saw (fast-check, seeded)', () => {
  test('every plan the engine returns for a saw, or a breakdown saw and a second saw, passes validatePlan for them', async () => {
    await fc.assert(
      fc.asyncProperty(withSaws, async (req) => {
        const plan = await optimize(req);
        expect(validatePlan(req, plan)).toEqual([]);
        const names = new Set(plan.pieces.flatMap((p) => p.sawOrder!.map((s) => s.saw)));
        for (const n of names) expect(['Table saw', 'Track saw']).toContain(n);
      }),
      { numRuns: 60, seed: 1403 },
    );
  });

  test('a table saw alone with a 610 mm sled, 762 mm rip capacity and 10 mm trim: the strips’ ends are trimmed on the strips', async () => {
    const tableSaw: NestSaw = {
      ...base,
      kind: 'table-saw',
      name: 'Table saw',
      kerf: 3.2,
      ripCapacity: 762,
      crosscutCapacity: 610,
      maxStages: 3,
      firstStage: 'rip',
      minFenceWidth: 25.4,
    };
    // Parts no wider than the sled, so every crosscut of a strip fits it (common practice, no source: a 24″ sled).
    const fitting = requestArb.map(
      (r): NestRequestInput => ({
        ...r,
        parts: r.parts.map((p) => ({
          ...p,
          width: Math.min(p.width, 600),
          length: Math.max(p.length, Math.min(p.width, 600)),
          grain: 'along-length' as const,
        })),
        stock: r.stock.map((s) => ({ ...s, grain: 'along-length' as const })),
        settings: { ...r.settings, kerf: 3.2, trim: 10, saw: tableSaw },
      }),
    );
    await fc.assert(
      fc.asyncProperty(fitting, async (req) => {
        const plan = await optimize(req);
        expect(validatePlan(req, plan)).toEqual([]);
      }),
      { numRuns: 40, seed: 2440 },
    );
  });
});

import { describe, expect, test } from 'vitest';
import { childName, letters, replaySawOrder } from '@/lib/nesting/saw-order';
import fc from 'fast-check';
import { optimize } from '@/lib/nesting/optimize';
import { validatePlan } from '@/lib/nesting/validate-plan';
import { at, handPlan, part, request, requestArb, sheet } from '@/lib/nesting/test-support';
import { DEFAULT_MIN_FENCE_WIDTH } from '@/shared/schemas/nesting';

const brief = (s: {
  n: number;
  kind: string;
  piece: string;
  reference: string;
  fence: number;
  length: number;
  trim: boolean;
  produces: { name: string; role: string }[];
}) => [s.n, s.kind, s.piece, s.reference, +s.fence.toFixed(6), s.length, s.trim, s.produces.map((p) => `${p.name}:${p.role}`).join(' ')];

describe('piece names', () => {
  test.each([
    [0, 'A'],
    [25, 'Z'],
    [26, 'AA'],
    [27, 'AB'],
  ])('stock piece %i is called %s', (i, name) => expect(letters(i)).toBe(name));

  test('pieces alternate numbers and letters by depth', () => {
    expect(childName('A', 1)).toBe('A1');
    expect(childName('A1', 2)).toBe('A1b');
    expect(childName('A1b', 3)).toBe('A1b3');
    expect(childName('A1', 27)).toBe('A1aa');
  });
});

describe('saw order from a layout', () => {
  // Hand-checked layout (kerf 3, no trim) on a 1000 × 500 panel: a 600 × 300 and a 300 × 300 side by side in a
  // 300 strip, a 1000 × 150 strip above them. Fence = width of the piece between blade and fence.
  const req = request([part('a', 600, 300), part('b', 300, 300), part('c', 1000, 150)], [sheet('S', 1000, 500)], {
    kerf: 3,
    minOffcutLength: 300,
    minOffcutWidth: 100,
  });
  const plan = handPlan(req, 'S', [at('a', 0, 0, 600, 300), at('b', 603, 0, 300, 300), at('c', 0, 303, 1000, 150)]);

  test('rips the strips first, then crosscuts each strip, measured from the fence (hand-checked, [derived])', () => {
    expect(plan.pieces[0].sawOrder!.map(brief)).toEqual([
      [1, 'rip', 'A', 'low', 300, 1000, false, 'A1:piece A:piece'],
      [2, 'rip', 'A', 'low', 150, 1000, false, 'A2:part A3:waste'],
      [3, 'crosscut', 'A1', 'low', 600, 300, false, 'A1a:part A1:piece'],
      [4, 'crosscut', 'A1', 'low', 300, 300, false, 'A1b:part A1c:waste'],
    ]);
  });

  test('says which part each piece becomes', () => {
    const steps = plan.pieces[0].sawOrder!;
    expect(steps[1].produces[0].parts).toEqual([{ partId: 'c', instance: 1 }]);
    expect(steps[0].produces[0].parts).toEqual([
      { partId: 'a', instance: 1 },
      { partId: 'b', instance: 1 },
    ]);
  });

  test('figures count the cuts and their length', () => {
    expect(plan.pieces[0].figures).toMatchObject({ cuts: 4, cutLength: 2600, partArea: 600 * 300 + 300 * 300 + 1000 * 150, stockArea: 500_000 });
  });

  test('replaying the saw order leaves every part as its own piece', () => {
    const { pieces, problems } = replaySawOrder(plan.pieces[0].sawOrder!, { x: 0, y: 0, w: 1000, h: 500 }, 'A', 3);
    expect(problems).toEqual([]);
    expect(pieces.get('A1a')).toEqual({ x: 0, y: 0, w: 600, h: 300 });
    expect(pieces.get('A1b')).toEqual({ x: 603, y: 0, w: 300, h: 300 });
    expect(pieces.get('A2')).toEqual({ x: 0, y: 303, w: 1000, h: 150 });
  });

  test('takes the edge trim first and keeps waste off the fence side (hand-checked, [derived])', () => {
    // 10 mm trim per side (kerf included), kerf 3: the 7 mm trim strips fall off the free side of the blade.
    const trimmed = request([part('p', 400, 200)], [sheet('S', 1000, 500)], { kerf: 3, trim: 10, minOffcutLength: 300, minOffcutWidth: 100 });
    const steps = handPlan(trimmed, 'S', [at('p', 10, 10, 400, 200)]).pieces[0].sawOrder!;
    expect(steps.map(brief)).toEqual([
      [1, 'crosscut', 'A', 'high', 990, 500, true, 'A1:waste A:piece'],
      [2, 'crosscut', 'A', 'low', 980, 500, true, 'A2:piece A3:waste'],
      [3, 'rip', 'A2', 'high', 490, 980, true, 'A2a:waste A2:piece'],
      [4, 'rip', 'A2', 'low', 200, 980, false, 'A2b:piece A2:piece'],
      [5, 'rip', 'A2', 'low', 277, 980, true, 'A2c:offcut A2d:waste'],
      [6, 'crosscut', 'A2b', 'low', 400, 200, false, 'A2b1:part A2b2:offcut'],
    ]);
  });

  test('a trim rip on a board never sets the fence to the trim strip: the sliver falls free (common practice, no source)', () => {
    // A 150 mm board, 10 mm trim (kerf 3 inside it) and 1″ (25.4 mm) the least between blade and fence.
    const board = request([part('p', 800, 130)], [sheet('B', 1000, 150, { kind: 'board' })], {
      kerf: 3,
      trim: 10,
      minOffcutLength: 300,
      minOffcutWidth: 100,
      minFenceWidth: 25.4,
    });
    const steps = handPlan(board, 'B', [at('p', 10, 10, 800, 130)]).pieces[0].sawOrder!;
    for (const step of steps.filter((st) => st.kind === 'rip')) {
      expect(step.fence, `step ${step.n}`).toBeGreaterThanOrEqual(25.4);
      expect(step.narrow).toBeUndefined();
    }
  });

  test('a strip narrower than 1″ is ripped with it on the free side: the fence measures the wide side', () => {
    // 1000 × 200 sheet, one 20 mm strip along the low edge, kerf 3: fence 200 − 20 − 3 = 177 mm from the high edge.
    const strip = request([part('s', 1000, 20)], [sheet('S', 1000, 200)], {
      kerf: 3,
      minOffcutLength: 300,
      minOffcutWidth: 100,
      minFenceWidth: 25.4,
    });
    const [first] = handPlan(strip, 'S', [at('s', 0, 0, 1000, 20)]).pieces[0].sawOrder!;
    expect(brief(first)).toEqual([1, 'rip', 'A', 'high', 177, 1000, false, 'A1:part A2:offcut']);
    // Without the rule (0) the strip itself sat between blade and fence.
    const unsafe = request([part('s', 1000, 20)], [sheet('S', 1000, 200)], { kerf: 3, minOffcutLength: 300, minOffcutWidth: 100, minFenceWidth: 0 });
    expect(handPlan(unsafe, 'S', [at('s', 0, 0, 1000, 20)]).pieces[0].sawOrder![0]).toMatchObject({ reference: 'low', fence: 20 });
  });

  test('validatePlan refuses a saw order with a strip under the safe minimum between blade and fence', () => {
    const strip = request([part('s', 1000, 20)], [sheet('S', 1000, 200)], {
      kerf: 3,
      minOffcutLength: 300,
      minOffcutWidth: 100,
      minFenceWidth: 25.4,
    });
    const plan = handPlan(strip, 'S', [at('s', 0, 0, 1000, 20)]);
    expect(validatePlan(strip, plan)).toEqual([]);
    const [first, ...rest] = plan.pieces[0].sawOrder!;
    // The same cut measured from the strip's side: 20 mm at the fence.
    const unsafe = { ...plan, pieces: [{ ...plan.pieces[0], sawOrder: [{ ...first, reference: 'low' as const, fence: 20 }, ...rest] }] };
    expect(validatePlan(strip, unsafe).map((v) => v.code)).toEqual(['unsafe-fence']);
  });

  test('a rip with both sides under 1″ is marked for a sled, track saw or band saw, and still replays', () => {
    // A 40 mm wide piece split into 18 and 19 mm with a 3 mm kerf: no fence setting leaves 25.4 mm at the fence.
    const both = request([part('a', 1000, 18), part('b', 1000, 19)], [sheet('S', 1000, 40)], {
      kerf: 3,
      minOffcutLength: 300,
      minOffcutWidth: 100,
      minFenceWidth: 25.4,
    });
    const steps = handPlan(both, 'S', [at('a', 0, 0, 1000, 18), at('b', 0, 21, 1000, 19)]).pieces[0].sawOrder!;
    expect(steps).toHaveLength(1);
    expect(steps[0]).toMatchObject({ kind: 'rip', narrow: true });
    expect(replaySawOrder(steps, { x: 0, y: 0, w: 1000, h: 40 }, 'A', 3).problems).toEqual([]);
  });

  test('on any plan, every rip leaves at least 1″ between blade and fence, or is marked narrow because neither side can', async () => {
    await fc.assert(
      fc.asyncProperty(requestArb, async (req) => {
        const plan = await optimize(req);
        for (const step of plan.pieces.flatMap((p) => p.sawOrder ?? []).filter((st) => st.kind === 'rip')) {
          if (step.narrow) for (const side of step.produces) expect(side.h).toBeLessThan(DEFAULT_MIN_FENCE_WIDTH);
          else expect(step.fence).toBeGreaterThanOrEqual(DEFAULT_MIN_FENCE_WIDTH - 1e-6);
        }
      }),
      { numRuns: 40, seed: 20261202 },
    );
  });

  test('a trim thinner than the kerf is one cut that leaves no strip', () => {
    const fits = handPlan(request([part('p', 996, 496)], [sheet('S', 1000, 500)], { kerf: 3, trim: 2 }), 'S', [at('p', 2, 2, 996, 496)]);
    const steps = fits.pieces[0].sawOrder!;
    expect(steps).toHaveLength(4);
    expect(steps.every((s) => s.trim && s.produces.length === 1)).toBe(true);
    expect(steps.at(-1)!.produces[0]).toMatchObject({ x: 2, y: 2, w: 996, h: 496, role: 'part' });
  });
});

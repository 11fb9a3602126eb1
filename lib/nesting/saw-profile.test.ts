import { describe, expect, test } from 'vitest';
import { validatePlan } from '@/lib/nesting/validate-plan';
import { stepStages } from '@/lib/nesting/saw-profile';
import { at, handPlan, part, request, sheet } from '@/lib/nesting/test-support';
import type { NestSaw } from '@/shared/schemas/saw';

const codes = (v: { code: string }[]) => [...new Set(v.map((x) => x.code))].sort();

const saw = (more: Partial<NestSaw> = {}): NestSaw => ({
  kind: 'table-saw',
  kindName: null,
  name: 'Table saw',
  kerf: 3,
  ripCapacity: null,
  crosscutCapacity: null,
  maxPieceLength: null,
  maxPieceWidth: null,
  maxStages: null,
  firstStage: 'rip',
  minFenceWidth: 25.4,
  ...more,
});
const track = (more: Partial<NestSaw> = {}): NestSaw => saw({ kind: 'track-saw', name: 'Track saw', minFenceWidth: 0, ...more });

// Every layout below is on a 1000 × 500 mm sheet (x along its length), kerf 3 mm, no trim, and worked by hand.
const S = () => sheet('S', 1000, 500);

describe('validatePlan checks the saw (worked by hand)', () => {
  // Two full-length strips: one rip at y = 250 leaves 250 mm below the blade and 500 − 253 = 247 mm above it.
  const twoStrips = () => ({ parts: [part('a', 1000, 250), part('b', 1000, 247)], layout: [at('a', 0, 0, 1000, 250), at('b', 0, 253, 1000, 247)] });

  test('rip capacity: a fence setting of 250 or 247 mm is beyond a 200 mm capacity; 250 mm is within its own', () => {
    const { parts, layout } = twoStrips();
    const narrowSaw = request(parts, [S()], { saw: saw({ ripCapacity: 200 }) });
    const v = validatePlan(narrowSaw, handPlan(narrowSaw, 'S', layout));
    expect(codes(v)).toEqual(['rip-capacity']);
    expect(v[0]).toMatchObject({ piece: 0, step: 1 });
    const enough = request(parts, [S()], { saw: saw({ ripCapacity: 250 }) });
    const plan = handPlan(enough, 'S', layout);
    expect(validatePlan(enough, plan)).toEqual([]);
    expect(plan.pieces[0].sawOrder![0]).toMatchObject({ kind: 'rip', fence: 250, saw: 'Table saw' });
  });

  test('rip capacity: the piece is turned so the side within the capacity rides the fence (247 mm on a 248 mm saw)', () => {
    const { parts, layout } = twoStrips();
    const r = request(parts, [S()], { saw: saw({ ripCapacity: 248 }) });
    const plan = handPlan(r, 'S', layout);
    expect(plan.pieces[0].sawOrder![0]).toMatchObject({ reference: 'high', fence: 247 });
    expect(validatePlan(r, plan)).toEqual([]);
  });

  test('a breakdown track saw makes the rip the table saw cannot, and the saw order says so', () => {
    const { parts, layout } = twoStrips();
    const r = request(parts, [S()], { saw: saw({ ripCapacity: 200 }), breakdownSaw: track({ crosscutCapacity: 1400 }) });
    const plan = handPlan(r, 'S', layout);
    expect(plan.pieces[0].sawOrder!.map((s) => s.saw)).toEqual(['Track saw']);
    expect(validatePlan(r, plan)).toEqual([]);
    // A 900 mm track is shorter than the 1000 mm rip: neither saw can make it.
    const short = request(parts, [S()], { saw: saw({ ripCapacity: 200 }), breakdownSaw: track({ crosscutCapacity: 900 }) });
    expect(codes(validatePlan(short, handPlan(short, 'S', layout)))).toEqual(['rip-capacity']);
  });

  // One crosscut at x = 600 through the whole 500 mm width.
  const twoBlocks = { parts: [part('c', 600, 500), part('d', 397, 500)], layout: [at('c', 0, 0, 600, 500), at('d', 603, 0, 397, 500)] };

  test('crosscut capacity: a 500 mm crosscut is longer than a 450 mm sled takes, not than a 500 mm one', () => {
    const short = request(twoBlocks.parts, [S()], { saw: saw({ crosscutCapacity: 450 }) });
    const v = validatePlan(short, handPlan(short, 'S', twoBlocks.layout));
    expect(codes(v)).toEqual(['crosscut-capacity']);
    expect(v[0].message).toContain('500 mm crosscut');
    const enough = request(twoBlocks.parts, [S()], { saw: saw({ crosscutCapacity: 500 }) });
    expect(validatePlan(enough, handPlan(enough, 'S', twoBlocks.layout))).toEqual([]);
  });

  test('crosscut capacity bounds a table saw’s crosscuts only, but every cut of a track saw (its track)', () => {
    const { parts, layout } = twoStrips();
    // The rip is 1000 mm long: no sled limit applies to a rip on a table saw …
    const table = request(parts, [S()], { saw: saw({ crosscutCapacity: 450 }) });
    expect(validatePlan(table, handPlan(table, 'S', layout))).toEqual([]);
    // … but a 950 mm track cannot make a 1000 mm cut.
    const rail = request(parts, [S()], { saw: track({ crosscutCapacity: 950 }) });
    expect(codes(validatePlan(rail, handPlan(rail, 'S', layout)))).toEqual(['crosscut-capacity']);
  });

  test('largest piece: a 1000 × 500 sheet is too large for a saw that takes 800 × 500, until a track saw breaks it down', () => {
    const only = request(twoBlocks.parts, [S()], { saw: saw({ maxPieceLength: 800, maxPieceWidth: 500 }) });
    expect(codes(validatePlan(only, handPlan(only, 'S', twoBlocks.layout)))).toEqual(['saw-piece-too-large']);
    const both = request(twoBlocks.parts, [S()], { saw: saw({ maxPieceLength: 800, maxPieceWidth: 500 }), breakdownSaw: track() });
    const plan = handPlan(both, 'S', twoBlocks.layout);
    expect(plan.pieces[0].sawOrder!.map((s) => s.saw)).toEqual(['Track saw']);
    expect(validatePlan(both, plan)).toEqual([]);
  });

  // p on top of q | r, with s beside them: the first rip cannot split the left group from s.
  const fourParts = {
    parts: [part('p', 300, 100), part('q', 140, 197), part('r', 157, 197), part('s', 200, 300)],
    layout: [at('p', 0, 0, 300, 100), at('q', 0, 103, 140, 197), at('r', 143, 103, 157, 197), at('s', 303, 0, 200, 300)],
  };

  test('stages and the first direction: crosscut at 300, rip under p, crosscut between q and r = 3 stages crosscut first', () => {
    const { parts, layout } = fourParts;
    const ripFirst = request(parts, [S()], { saw: saw({ maxStages: 3, firstStage: 'rip' }) });
    expect(codes(validatePlan(ripFirst, handPlan(ripFirst, 'S', layout)))).toEqual(['first-stage']);
    const crossFirst = request(parts, [S()], { saw: saw({ maxStages: 3, firstStage: 'crosscut' }) });
    expect(validatePlan(crossFirst, handPlan(crossFirst, 'S', layout))).toEqual([]);
    const twoStages = request(parts, [S()], { saw: saw({ maxStages: 2, firstStage: 'crosscut' }) });
    expect(codes(validatePlan(twoStages, handPlan(twoStages, 'S', layout)))).toEqual(['too-many-stages']);
    const any = request(parts, [S()], { saw: saw({ maxStages: null }) });
    expect(validatePlan(any, handPlan(any, 'S', layout))).toEqual([]);
  });

  test('stages are counted on each saw’s own steps: rips of the sheet 1, crosscuts of a strip 2, a trim rip 3', () => {
    // Strip 1 (y 0–300) holds p (300 × 300) and q (300 × 250, so a trim rip at y = 250); strip 2 is waste.
    const r = request([part('p', 300, 300), part('q', 300, 250)], [S()], { saw: saw({ maxStages: 3 }) });
    const plan = handPlan(r, 'S', [at('p', 0, 0, 300, 300), at('q', 303, 0, 300, 250)]);
    const steps = plan.pieces[0].sawOrder!;
    expect(steps.map((s) => s.kind)).toEqual(['rip', 'crosscut', 'crosscut', 'rip']);
    expect(stepStages(steps, 'A', [saw({ maxStages: 3 })])).toEqual([1, 2, 2, 3]);
    expect(validatePlan(r, plan)).toEqual([]);
    // In 2 stages only crosscuts first will do (crosscut at x = 300, then the rip at y = 250 under q).
    const two = request([part('p', 300, 300), part('q', 300, 250)], [S()], { saw: saw({ maxStages: 2 }) });
    expect(codes(validatePlan(two, handPlan(two, 'S', [at('p', 0, 0, 300, 300), at('q', 303, 0, 300, 250)])))).toEqual(['first-stage']);
  });

  test('safe minimum: a 17 mm strip cut against the fence is refused; with the wide side on the fence it is not', () => {
    // One rip at y = 480: the part (480 mm) below the blade, 500 − 483 = 17 mm of waste above it.
    const r = request([part('a', 1000, 480)], [S()], { saw: saw() });
    const plan = handPlan(r, 'S', [at('a', 0, 0, 1000, 480)]);
    expect(plan.pieces[0].sawOrder![0]).toMatchObject({ reference: 'low', fence: 480 });
    expect(validatePlan(r, plan)).toEqual([]);
    const against = structuredClone(plan);
    Object.assign(against.pieces[0].sawOrder![0], { reference: 'high', fence: 17 });
    const v = validatePlan(r, against);
    expect(codes(v)).toEqual(['unsafe-fence']);
    expect(v[0].message).toContain('25.4 mm safe minimum');
  });

  test('the plan’s kerf is at least each saw’s, and every step names one of the nest’s saws', () => {
    const { parts, layout } = twoStrips();
    const thin = request(parts, [S()], { kerf: 3, saw: saw({ kerf: 3.2 }) });
    expect(codes(validatePlan(thin, handPlan(thin, 'S', layout)))).toEqual(['saw-kerf']);
    const r = request(parts, [S()], { saw: saw() });
    const plan = handPlan(r, 'S', layout);
    plan.pieces[0].sawOrder![0].saw = 'Band saw';
    expect(codes(validatePlan(r, plan))).toEqual(['unknown-saw']);
  });
});

describe('the engine on a saw used with 2 stages (worked by hand)', () => {
  test('strips as wide as their parts: 2 × 400 × 200 in a 200 mm strip, the 300 × 150 in a 150 mm strip above it', async () => {
    const { optimize } = await import('@/lib/nesting/optimize');
    const r = request([part('a', 400, 200, { quantity: 2 }), part('b', 300, 150)], [S()], { saw: saw({ maxStages: 2 }) });
    const plan = await optimize(r);
    expect(validatePlan(r, plan)).toEqual([]);
    expect(plan.pieces).toHaveLength(1);
    const at = (id: string, k = 1) => plan.pieces[0].placements.find((p) => p.partId === id && p.instance === k)!;
    // Strip 1: y 0–200, parts at x = 0 and 400 + 3 = 403. Strip 2 starts one kerf above: y = 203.
    expect([at('a', 1), at('a', 2)].map((p) => [p.x, p.y]).sort((u, v) => u[0] - v[0])).toEqual([
      [0, 0],
      [403, 0],
    ]);
    expect([at('b').x, at('b').y]).toEqual([0, 203]);
    const steps = plan.pieces[0].sawOrder!;
    expect(Math.max(...stepStages(steps, 'A', [saw({ maxStages: 2 })]))).toBe(2);
  });
});

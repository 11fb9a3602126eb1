import { describe, expect, test } from 'vitest';
import { validatePlan } from '@/lib/nesting/validate-plan';
import { at, handPlan, part, request, sheet } from '@/lib/nesting/test-support';
import type { Plan } from '@/shared/schemas/nesting';

const codes = (v: { code: string }[]) => [...new Set(v.map((x) => x.code))].sort();
const clone = (p: Plan): Plan => structuredClone(p);

const req = request([part('a', 600, 300), part('b', 300, 300, { quantity: 2 }), part('c', 1000, 150)], [sheet('S', 1000, 500, { count: 1 })], {
  kerf: 3,
});
const good = handPlan(req, 'S', [at('a', 0, 0, 600, 300), at('b', 603, 0, 300, 300), at('c', 0, 303, 1000, 150)]);
good.unplaced.push({ partId: 'b', instance: 2, label: 'b', reason: 'no-stock-left', message: 'not enough stock' });

describe('validatePlan', () => {
  test('passes a sound hand-made plan', () => {
    expect(validatePlan(req, good)).toEqual([]);
  });

  test('catches two parts overlapping', () => {
    const bad = clone(good);
    bad.pieces[0].placements[1].x = 500;
    const v = validatePlan(req, bad);
    expect(codes(v)).toContain('overlap');
    expect(v.find((x) => x.code === 'overlap')).toMatchObject({ piece: 0, partId: 'b', instance: 1 });
  });

  test('catches parts touching with no room for the kerf', () => {
    const bad = clone(good);
    bad.pieces[0].placements[1].x = 600;
    delete bad.pieces[0].tree;
    delete bad.pieces[0].sawOrder;
    expect(validatePlan(req, bad).map((x) => x.code)).toEqual(['overlap']);
  });

  test('lets parts touch when the kerf is zero', () => {
    const zero = request(req.parts, req.stock, { kerf: 0 });
    const plan = handPlan(zero, 'S', [at('a', 0, 0, 600, 300), at('b', 600, 0, 300, 300), at('c', 0, 300, 1000, 150)]);
    plan.unplaced = good.unplaced;
    expect(validatePlan(zero, plan)).toEqual([]);
  });

  test('catches a part hanging off the stock', () => {
    const bad = clone(good);
    Object.assign(bad.pieces[0].placements[2], { y: 400 });
    delete bad.pieces[0].sawOrder;
    delete bad.pieces[0].tree;
    const v = validatePlan(req, bad);
    expect(codes(v)).toEqual(['outside-stock']);
  });

  test('catches a part inside the edge trim', () => {
    const trimmed = request(req.parts, req.stock, { kerf: 3, trim: 5 });
    const bad = clone(good);
    bad.pieces[0].trim = 5;
    delete bad.pieces[0].sawOrder;
    delete bad.pieces[0].tree;
    expect(codes(validatePlan(trimmed, bad))).toEqual(['outside-stock']);
  });

  test('catches a grain-locked part turned on grained stock, and allows it on grainless stock', () => {
    const grained = request([part('g', 300, 200)], [sheet('S', 1000, 500)], { kerf: 3 });
    const turned = handPlan(grained, 'S', [at('g', 0, 0, 200, 300, { rotated: true })]);
    expect(codes(validatePlan(grained, turned))).toEqual(['grain']);
    const mdf = request([part('g', 300, 200)], [sheet('S', 1000, 500, { grain: 'none' })], { kerf: 3 });
    expect(validatePlan(mdf, handPlan(mdf, 'S', [at('g', 0, 0, 200, 300, { rotated: true })]))).toEqual([]);
  });

  test('catches a part placed at the wrong size', () => {
    const bad = clone(good);
    bad.pieces[0].placements[0].w = 590;
    delete bad.pieces[0].sawOrder;
    delete bad.pieces[0].tree;
    expect(codes(validatePlan(req, bad))).toEqual(['size-mismatch']);
  });

  test('catches a missing part, a duplicate and one more than asked for', () => {
    const missing = clone(good);
    missing.unplaced = [];
    expect(validatePlan(req, missing)).toEqual([expect.objectContaining({ code: 'missing-part', partId: 'b', instance: 2 })]);
    const twice = clone(good);
    twice.unplaced.push({ ...twice.unplaced[0] });
    expect(codes(validatePlan(req, twice))).toEqual(['duplicate-part']);
    const extra = clone(good);
    extra.unplaced.push({ ...extra.unplaced[0], instance: 3 });
    expect(codes(validatePlan(req, extra))).toEqual(['extra-part']);
    const stranger = clone(good);
    stranger.unplaced.push({ ...stranger.unplaced[0], partId: 'zz' });
    expect(codes(validatePlan(req, stranger))).toEqual(['unknown-part']);
  });

  test('catches the classic five-rectangle pinwheel, which no straight through-cut can start', () => {
    const pin = request(
      [part('a', 200, 100), part('b', 100, 200), part('c', 200, 100), part('d', 100, 200), part('e', 100, 100)],
      [sheet('S', 300, 300)],
      { kerf: 0 },
    );
    const plan = handPlan(pin, 'S', [
      at('a', 0, 0, 200, 100),
      at('b', 200, 0, 100, 200),
      at('c', 100, 200, 200, 100),
      at('d', 0, 100, 100, 200),
      at('e', 100, 100, 100, 100),
    ]);
    expect(plan.pieces[0].tree).toBeUndefined();
    expect(validatePlan(pin, plan)).toEqual([expect.objectContaining({ code: 'not-guillotine', piece: 0 })]);
  });

  test('catches a strip layout that needs a fourth stage', () => {
    // The 200 × 300 part beside them keeps the first rip from splitting the left group.
    const parts = [part('p', 300, 100), part('q', 140, 197), part('r', 157, 197), part('s', 200, 300)];
    const layout = [at('p', 0, 0, 300, 100), at('q', 0, 103, 140, 197), at('r', 143, 103, 157, 197), at('s', 303, 0, 200, 300)];
    const panel = request(parts, [sheet('S', 1000, 500)], { kerf: 3, style: 'panel' });
    expect(validatePlan(panel, handPlan(panel, 'S', layout))).toEqual([]);
    const strips = request(parts, [sheet('S', 1000, 500)], { kerf: 3, style: 'strips' });
    // Worked by hand: a crosscut at x = 300 first (then a rip under p, then a crosscut between q and r) takes 3 stages.
    expect(codes(validatePlan(strips, handPlan(strips, 'S', layout)))).toEqual(['first-stage']);
  });

  test('catches a saw order with one cut moved', () => {
    const bad = clone(good);
    const step = bad.pieces[0].sawOrder!.find((s) => s.piece === 'A1' && s.kind === 'crosscut')!;
    step.fence += 5;
    const v = validatePlan(req, bad);
    expect(codes(v)).toEqual(['saw-order']);
    expect(v.some((x) => x.step === step.n)).toBe(true);
    expect(v.some((x) => x.partId === 'a')).toBe(true);
  });

  test('catches a saw order that cuts a piece not yet made, or leaves a part uncut', () => {
    const early = clone(good);
    const order = early.pieces[0].sawOrder!;
    [order[0], order[2]] = [order[2], order[0]];
    order.forEach((s, i) => (s.n = i + 1));
    expect(codes(validatePlan(req, early))).toEqual(['saw-order']);
    const short = clone(good);
    short.pieces[0].sawOrder!.pop();
    expect(validatePlan(req, short)).toEqual([expect.objectContaining({ code: 'saw-order', partId: 'b' })]);
  });

  test('catches a cut tree whose leaf is not where its part is', () => {
    const bad = clone(good);
    const p = bad.pieces[0].placements;
    [p[0], p[2]] = [p[2], p[0]];
    expect(codes(validatePlan(req, bad))).toEqual(['tree']);
  });

  test('catches more stock used than is on hand, and stock that is not in the request', () => {
    const two = clone(good);
    two.pieces.push({ ...clone(good).pieces[0], placements: [] });
    two.pieces[1].sawOrder = undefined;
    two.pieces[1].tree = undefined;
    expect(codes(validatePlan(req, two))).toEqual(['stock-count']);
    const unknown = clone(good);
    unknown.pieces[0].stockId = 'nope';
    // With its piece on unknown stock, sheet S is unused again, so b #2 could have gone there too.
    expect(codes(validatePlan(req, unknown))).toEqual(['unknown-stock', 'unplaced-reason']);
  });

  test.each([
    { label: 'too large, though it fits the sheet', reason: 'too-large' as const, count: 1 },
    { label: 'held off by grain, though it fits unturned', reason: 'grain' as const, count: 1 },
    { label: 'out of stock, though the sheet can be bought', reason: 'no-stock-left' as const, count: null },
    { label: 'without stock of its material, though there is some', reason: 'no-stock' as const, count: 1 },
  ])('catches an unplaced part reported $label', ({ reason, count }) => {
    const r = request(req.parts, [sheet('S', 1000, 500, { count })], { kerf: 3 });
    const bad = clone(good);
    bad.unplaced[0].reason = reason;
    expect(validatePlan(r, bad)).toEqual([expect.objectContaining({ code: 'unplaced-reason', partId: 'b', instance: 2 })]);
  });

  test('reports a plan that does not parse instead of throwing', () => {
    expect(codes(validatePlan(req, { version: 2, pieces: [], unplaced: [] }))).toEqual(['invalid-plan']);
    expect(codes(validatePlan(req, null))).toEqual(['invalid-plan']);
  });
});

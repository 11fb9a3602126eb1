import { describe, expect, test } from 'vitest';
import { readPlan, readStoredPlan, PlanVersionError } from '@/lib/nesting/read-plan';
import { at, handPlan, part, request, sheet } from '@/lib/nesting/test-support';

describe('readPlan', () => {
  const plan = handPlan(request([part('p', 500, 400)], [sheet('S', 1000, 500)]), 'S', [at('p', 0, 0, 500, 400)]);

  test('reads a saved version-1 plan back as it was', () => {
    expect(readPlan(JSON.parse(JSON.stringify(plan)))).toEqual(plan);
  });

  test.each([
    { label: 'a newer version', saved: { ...plan, version: 2 }, message: /newer Kerfwise/ },
    { label: 'no version', saved: { pieces: [] }, message: /known version/ },
    { label: 'not an object', saved: 'plan', message: /known version/ },
  ])('refuses $label instead of misreading it', ({ saved, message }) => {
    expect(() => readPlan(saved)).toThrow(PlanVersionError);
    expect(() => readPlan(saved)).toThrow(message);
  });

  test('refuses a version-1 plan with a broken field, naming it', () => {
    expect(() => readPlan({ ...plan, pieces: [{ ...plan.pieces[0], length: -1 }] })).toThrow(/length/);
  });
});

describe('readStoredPlan', () => {
  const req = request([part('p', 500, 400)], [sheet('S', 1000, 500)]);
  const plan = handPlan(req, 'S', [at('p', 0, 0, 500, 400)]);

  test('a stored plan comes back as its document and the request it was nested from', () => {
    const stored = JSON.parse(JSON.stringify({ document: plan, request: req }));
    const read = readStoredPlan(stored);
    expect(read.document).toEqual(plan);
    expect(read.request?.parts.map((p) => p.id)).toEqual(['p']);
  });

  test('a request that no longer parses is null (the shop’s settings stand in), a broken document is an error', () => {
    expect(readStoredPlan({ document: plan, request: { parts: 'gone' } }).request).toBeNull();
    expect(() => readStoredPlan({ document: { ...plan, version: 99 }, request: req })).toThrow(PlanVersionError);
  });
});

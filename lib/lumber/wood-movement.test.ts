import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inches, toInches } from '@/lib/units/length';
import type { SpeciesId } from './species';
import { SPECIES_IDS } from './species';
import { dimensionalChange, MOVEMENT_WARNING_THRESHOLD_MM, movementWarning } from './wood-movement';

const FPL = 'USDA FPL Wood Handbook FPL-GTR-190 (2010), eq. 13-2, table 13-5';

/** The check values are printed rounded (RULES.md): agree to within half a unit of its last printed digit. */
const expectAsPrinted = (value: number, printed: number, decimals: number) =>
  expect(Math.abs(value - printed)).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-12);

describe('dimensional change across the width', () => {
  test.each([
    [`${FPL}: 12″ flatsawn red oak, 6→10 % → 0.177″`, 'red-oak', 12, 'flatsawn', 6, 10, 0.177],
    [`${FPL}: 12″ quartersawn red oak, 6→10 % → 0.076″`, 'red-oak', 12, 'quartersawn', 6, 10, 0.076],
    [`${FPL}: 10″ flatsawn white oak, ΔMC 3 → 0.110″`, 'white-oak', 10, 'flatsawn', 8, 11, 0.11],
    [`${FPL}: 18″ flatsawn hard maple, 6→12 % → 0.381″`, 'hard-maple', 18, 'flatsawn', 6, 12, 0.381],
  ] as const)('%s', (_label, species, widthIn, cut, mcFrom, mcTo, expectedIn) => {
    const { change, withinValidRange } = dimensionalChange({ species, width: inches(widthIn), cut, mcFrom, mcTo });
    expectAsPrinted(toInches(change), expectedIn, 3);
    expect(withinValidRange).toBe(true);
  });

  test.each([
    [`${FPL}: 500 mm flatsawn black cherry, ΔMC 5 → 6.2 mm`, 'black-cherry', 500, 7, 12, 6.2, 1],
    [`${FPL}: 300 mm flatsawn black walnut, ΔMC 4 → 3.29 mm`, 'black-walnut', 300, 6, 10, 3.29, 2],
  ] as const)('%s', (_label, species, width, mcFrom, mcTo, expected, decimals) => {
    expectAsPrinted(dimensionalChange({ species, width, cut: 'flatsawn', mcFrom, mcTo }).change, expected, decimals);
  });

  test(`${FPL}: drying shrinks (a negative change) and outside 6–14 % the result is flagged as an estimate`, () => {
    const dry = dimensionalChange({ species: 'red-oak', width: inches(12), cut: 'flatsawn', mcFrom: 10, mcTo: 6 });
    expect(toInches(dry.change)).toBeCloseTo(-0.177, 3);
    expect(dimensionalChange({ species: 'red-oak', width: 300, cut: 'flatsawn', mcFrom: 4, mcTo: 10 }).withinValidRange).toBe(false);
  });

  test('quartersawn stock moves less than flatsawn for every listed species, in proportion to width and ΔMC', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...SPECIES_IDS),
        fc.double({ min: 10, max: 1500, noNaN: true }),
        fc.integer({ min: 6, max: 13 }),
        (species: SpeciesId, w, mc) => {
          const flat = dimensionalChange({ species, width: w, cut: 'flatsawn', mcFrom: mc, mcTo: mc + 1 }).change;
          const quarter = dimensionalChange({ species, width: w, cut: 'quartersawn', mcFrom: mc, mcTo: mc + 1 }).change;
          expect(quarter).toBeLessThan(flat);
          expect(dimensionalChange({ species, width: 2 * w, cut: 'flatsawn', mcFrom: mc, mcTo: mc + 1 }).change).toBeCloseTo(2 * flat, 9);
        },
      ),
    );
  });
});

describe('warning about a fixed panel', () => {
  const panel = { species: 'red-oak', width: inches(12), cut: 'flatsawn', mcFrom: 6, mcTo: 10, fixedAcrossWidth: true } as const;

  test('common practice, no source: the default threshold is 1/16″', () => {
    expect(MOVEMENT_WARNING_THRESHOLD_MM).toBeCloseTo(1.5875, 9);
  });

  test(`${FPL}: a 12″ flatsawn red oak panel fixed across its width is warned about, with its movement`, () => {
    const message = movementWarning(panel);
    expect(message).toMatch(/12″ wide flatsawn red oak/);
    expect(message).toMatch(/swell about 0\.177″ \(4\.5 mm\)/);
    expect(message).toMatch(/more than the 1\/16″/);
    expect(message).toMatch(/quartersawn stock or plywood/);
  });

  test('a metric shop reads the warning in mm', () => {
    expect(
      movementWarning({ ...panel, width: 500, species: 'black-cherry', mcFrom: 7, mcTo: 12 }, { system: 'metric', precision: 1, feet: false }),
    ).toMatch(/500 mm wide .* about 6\.2 mm/);
  });

  test('a panel free to move, or moving less than the threshold, gets no warning', () => {
    expect(movementWarning({ ...panel, fixedAcrossWidth: false })).toBeNull();
    expect(movementWarning({ ...panel, width: inches(2) })).toBeNull(); // 2″ × 0.00369 × 4 = 0.0295″ < 1/16″
    expect(movementWarning({ ...panel, threshold: inches(1 / 4) })).toBeNull();
  });

  test('outside 6–14 % the warning says it is an estimate', () => {
    expect(movementWarning({ ...panel, mcFrom: 4 })).toMatch(/only an estimate.*6 % and 14 %/);
  });
});

describe('refusing what the handbook cannot answer', () => {
  const ok = { species: 'red-oak' as SpeciesId, width: 300, cut: 'flatsawn' as const, mcFrom: 6, mcTo: 10 };

  test(`${FPL}: quartersawn and riftsawn use the radial coefficient, and say so (12″ red oak, 6→10 %: 0.076″)`, () => {
    for (const cut of ['quartersawn', 'riftsawn'] as const) {
      const change = dimensionalChange({ ...ok, width: inches(12), cut });
      expect(change.basis).toBe('radial');
      expectAsPrinted(toInches(change.change), 0.076, 3);
    }
    expect(movementWarning({ ...ok, width: 800, cut: 'riftsawn', fixedAcrossWidth: true })).toContain('radial (quartersawn) coefficient');
  });

  test.each([
    ['a cut spelled another way', { cut: 'Quartersawn' }],
    ['no cut at all', { cut: undefined }],
    ['a species that is an object key, not a wood', { species: '__proto__' }],
    ['another object key', { species: 'toString' }],
    ['a moisture content that is not a number', { mcTo: Number.NaN }],
    ['a moisture content past fibre saturation', { mcTo: 200 }],
    ['a negative moisture content', { mcFrom: -2 }],
    ['an infinite width', { width: Number.POSITIVE_INFINITY }],
    ['a panel a kilometre wide', { width: 1_000_000 }],
  ])('refuses %s with a clear error', (_label, bad) => {
    expect(() => dimensionalChange({ ...ok, ...(bad as object) } as never)).toThrow(RangeError);
  });

  test('the warning is a sentence or null, never NaN, for any input it accepts', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...SPECIES_IDS),
        fc.double({ min: 1, max: 3000, noNaN: true }),
        fc.constantFrom('flatsawn' as const, 'quartersawn' as const, 'riftsawn' as const),
        fc.double({ min: 0, max: 30, noNaN: true }),
        fc.double({ min: 0, max: 30, noNaN: true }),
        (species, width, cut, mcFrom, mcTo) => {
          const warning = movementWarning({ species, width, cut, mcFrom, mcTo, fixedAcrossWidth: true });
          if (warning !== null) expect(warning).not.toMatch(/NaN|Infinity/);
          expect(Number.isFinite(dimensionalChange({ species, width, cut, mcFrom, mcTo }).change)).toBe(true);
        },
      ),
      { seed: 20261202 },
    );
  });
});

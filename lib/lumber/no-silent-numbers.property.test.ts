import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { expectSaneOrRefused } from '@/tests/support/sane';
import { boardFootCost, pricePerBoardFootFromCubicMetre } from './board-cost';
import { boardFeet, boardFeetToCubicMetres, cubicMetres, cubicMetresToBoardFeet } from './board-feet';
import { buyQuantity } from './buy-quantity';
import { SPECIES_IDS } from './species';
import { tally } from './surface-measure';
import { thicknessInches, thicknessToMm } from './thickness';
import { dimensionalChange, movementWarning } from './wood-movement';

const SEED = 20261202;
const anyNumber = fc.oneof(
  fc.double(),
  fc.integer(),
  fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -1, 0, 1e308, 5e-324),
);
/** Mostly plausible sizes (so the arithmetic is exercised), with any number mixed in. */
const size = fc.oneof(fc.double({ min: 1, max: 6000, noNaN: true }), anyNumber);
const thickness = fc.oneof(fc.record({ quarters: fc.oneof(fc.integer({ min: -4, max: 60 }), anyNumber) }), fc.record({ mm: size }));
const board = fc.record({ thickness, width: size, length: size });

describe('no public function of lib/lumber returns a silent wrong number (seeded properties)', () => {
  test('board feet, cubic metres and the yard tally: finite and positive, or refused', () => {
    fc.assert(
      fc.property(board, (b) => {
        const positive = (v: number) => expect(v).toBeGreaterThan(0);
        expectSaneOrRefused(() => boardFeet(b), positive);
        expectSaneOrRefused(() => cubicMetres(b), positive);
        expectSaneOrRefused(
          () => tally(b),
          (t) => expect(t.boardFeet >= 0 && Number.isInteger(t.surfaceMeasure) && Number.isInteger(t.lengthFt)).toBe(true),
        );
        expectSaneOrRefused(() => thicknessInches(b.thickness), positive);
        expectSaneOrRefused(() => thicknessToMm(b.thickness), positive);
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });

  test('conversions and cost: zero or more, finite, or refused', () => {
    fc.assert(
      fc.property(anyNumber, anyNumber, (a, b) => {
        const nonNegative = (v: number) => expect(v).toBeGreaterThanOrEqual(0);
        expectSaneOrRefused(() => boardFeetToCubicMetres(a), nonNegative);
        expectSaneOrRefused(() => cubicMetresToBoardFeet(a), nonNegative);
        expectSaneOrRefused(() => boardFootCost(a, b), nonNegative);
        expectSaneOrRefused(() => pricePerBoardFootFromCubicMetre(a), nonNegative);
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });

  test('buyQuantity: never less than the need, whole steps, finite — or refused (an infinite step included)', () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.double({ min: 0, max: 1e6, noNaN: true }), anyNumber),
        fc.oneof(fc.double({ min: 0, max: 0.95, noNaN: true }), anyNumber),
        fc.oneof(fc.constantFrom(1, 0.5, 10), anyNumber),
        (need, waste, step) => {
          expectSaneOrRefused(
            () => buyQuantity(need, waste, { step }),
            (q) => {
              expect(q.buy).toBeGreaterThanOrEqual(need - 1e-9);
              expect(q.exact).toBeGreaterThanOrEqual(need - 1e-9);
            },
          );
        },
      ),
      { seed: SEED, numRuns: 1000 },
    );
    expect(() => buyQuantity(10, 0.1, { step: Number.POSITIVE_INFINITY })).toThrow(RangeError);
  });

  test('wood movement: a finite change and a warning without NaN, or refused', () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.constantFrom(...SPECIES_IDS), fc.constantFrom('__proto__', 'toString', 'balsa')),
        size,
        fc.constantFrom('flatsawn', 'quartersawn', 'riftsawn', 'Quartersawn'),
        fc.oneof(fc.double({ min: 0, max: 30, noNaN: true }), anyNumber),
        fc.oneof(fc.double({ min: 0, max: 30, noNaN: true }), anyNumber),
        (species, width, cut, mcFrom, mcTo) => {
          const input = { species, width, cut, mcFrom, mcTo } as never;
          expectSaneOrRefused(() => dimensionalChange(input));
          expectSaneOrRefused(() => movementWarning({ ...(input as object), fixedAcrossWidth: true } as never));
        },
      ),
      { seed: SEED, numRuns: 1000 },
    );
  });
});

describe('refusals named in the issue, each with a clear message', () => {
  test.each([
    ['an infinite buying step (it gave NaN)', () => buyQuantity(100, 0.3, { step: Number.POSITIVE_INFINITY }), /buying step/],
    ['a board a kilometre long', () => boardFeet({ thickness: { quarters: 4 }, width: 150, length: 1_000_000 }), /length .* past 100000 mm/],
    ['a board 2 m thick', () => boardFeet({ thickness: { mm: 2000 }, width: 150, length: 2400 }), /thickness .* past/],
    ['an infinite price', () => boardFootCost(10, Number.POSITIVE_INFINITY), /price per board foot must be zero or more/],
    ['negative board feet', () => boardFeetToCubicMetres(-5), /board feet must be zero or more/],
    ['a NaN price per m³', () => pricePerBoardFootFromCubicMetre(Number.NaN), /price per cubic metre/],
  ])('%s', (_label, call, message) => {
    expect(call).toThrow(message);
  });
});

import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inches } from '@/lib/units/length';
import { pieceBoardFeet, takeoffLines, type TakeoffSize } from './takeoff';

const board = (over: Partial<TakeoffSize> = {}): TakeoffSize => ({
  stockId: 'stock:b',
  source: 'stock',
  kind: 'board',
  material: 'White oak',
  nominalThickness: '4/4',
  thicknessMm: inches(13 / 16),
  lengthMm: inches(96),
  widthMm: inches(6),
  count: 1,
  costEachCents: 0,
  availableNow: 0,
  ...over,
});

describe('board feet of a stock board', () => {
  test.each([
    ['AHEC "Measurement": 4/4 × 6″ × 8′ = 4.0 BF (on the nominal inch, not the surfaced 13/16″)', board(), 4],
    ['AHEC "Measurement", arithmetic from the definition: 8/4 × 7″ × 10′ = 11.667 BF', board({ nominalThickness: '8/4', widthMm: inches(7), lengthMm: inches(120) }), 11.667],
    ['[derived]: a board given in mm is measured on its actual thickness: 25.4 × 152.4 × 2438.4 mm = 4.0 BF', board({ nominalThickness: '25.4 mm', thicknessMm: 25.4 }), 4],
  ])('%s', (_label, size, bf) => {
    expect(pieceBoardFeet(size)).toBeCloseTo(bf, 3);
  });
});

describe('takeoff lines', () => {
  test('AHEC: ten 4/4 × 6″ × 8′ boards are 40 BF; at $9.25/bf ($37.00 each) they cost $370.00', () => {
    const { lines } = takeoffLines([board({ count: 10, costEachCents: 3700, availableNow: 30 })], 0);
    expect(lines[0]).toMatchObject({ boardFeet: expect.closeTo(40, 9), costCents: 37000, withWaste: 10, covered: true });
  });

  test('derived: buy = need / (1 − waste): 100 boards at 30 % waste are 143 to have ready', () => {
    const { lines } = takeoffLines([board({ count: 100, costEachCents: 100, availableNow: 120 })], 0.3);
    expect(lines[0]).toMatchObject({ withWaste: 143, costWithWasteCents: 14300, covered: true, coveredWithWaste: false });
  });

  test('[derived] a 4 × 8 ft sheet is 1219.2 × 2438.4 mm = 32 ft²; offcuts on the rack take no waste allowance', () => {
    const sheet = board({ kind: 'sheet', nominalThickness: '3/4"', lengthMm: inches(96), widthMm: inches(48), count: 3, costEachCents: 9400, availableNow: 2 });
    const offcut = board({ kind: 'offcut', source: 'offcut', count: 1, costEachCents: 800, availableNow: 1 });
    const { lines, totals } = takeoffLines([sheet, offcut], 0.15);
    expect(lines[0].areaMm2 / inches(12) ** 2).toBeCloseTo(96, 9);
    expect(lines[0]).toMatchObject({ boardFeet: null, withWaste: 4, costWithWasteCents: 37600, covered: false });
    expect(lines[1]).toMatchObject({ withWaste: 1, costWithWasteCents: 800, covered: true });
    expect(totals).toMatchObject({ costCents: 3 * 9400 + 800, covered: false });
  });

  test('with waste never asks for fewer pieces than the plan uses, nor costs less', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 500 }), fc.integer({ min: 0, max: 90 }), fc.integer({ min: 0, max: 100_000 }), (count, pct, cents) => {
        const [line] = takeoffLines([board({ count, costEachCents: cents })], pct / 100).lines;
        expect(line.withWaste).toBeGreaterThanOrEqual(count);
        expect(line.withWaste * (1 - pct / 100)).toBeGreaterThanOrEqual(count - 1e-9);
        expect(line.costWithWasteCents).toBeGreaterThanOrEqual(line.costCents);
      }),
    );
  });
});

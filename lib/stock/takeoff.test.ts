import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inches } from '@/lib/units/length';
import { pieceBoardFeet, takeoff, type TakeoffSize } from './takeoff';

const board = (over: Partial<TakeoffSize> = {}): TakeoffSize => ({
  stockId: 'stock:b',
  source: 'stock',
  kind: 'board',
  material: 'White oak',
  nominalThickness: '4/4',
  thickness: inches(13 / 16),
  length: inches(96),
  width: inches(6),
  count: 1,
  costEachCents: 0,
  free: 0,
  heldByPlan: 0,
  ...over,
});

describe('board feet of a stock board', () => {
  test.each([
    ['AHEC "Measurement": 4/4 × 6″ × 8′ = 4.0 BF (on the nominal inch, not the surfaced 13/16″)', board(), 4],
    [
      'AHEC "Measurement", arithmetic from the definition: 8/4 × 7″ × 10′ = 11.667 BF',
      board({ nominalThickness: '8/4', width: inches(7), length: inches(120) }),
      11.667,
    ],
    [
      '[derived]: a board given in mm is measured on its actual thickness: 25.4 × 152.4 × 2438.4 mm = 4.0 BF',
      board({ nominalThickness: '25.4 mm', thickness: 25.4 }),
      4,
    ],
  ])('%s', (_label, size, bf) => {
    expect(pieceBoardFeet(size)).toBeCloseTo(bf, 3);
  });
});

const sheet = (over: Partial<TakeoffSize> = {}): TakeoffSize =>
  board({ kind: 'sheet', material: 'Baltic birch', nominalThickness: '3/4"', thickness: 18, length: 1525, width: 1525, ...over });
const FT2 = inches(12) ** 2;

describe('the takeoff', () => {
  test('AHEC: ten 4/4 × 6″ × 8′ boards are 40 BF; at $9.25/bf ($37.00 each) they cost $370.00', () => {
    const { lines, totals } = takeoff([board({ count: 10, costEachCents: 3700, free: 30 })], 0);
    expect(lines[0]).toMatchObject({ boardFeet: expect.closeTo(40, 9), costCents: 37000, covered: true });
    expect(totals).toMatchObject({ costCents: 37000, allowanceCents: 0, costWithAllowanceCents: 37000 });
  });

  test('by hand: three materials of one sheet each at 15 % cost 15 % more ($196.50 → $225.98), not twice as much; two of each to have ready', () => {
    const sizes = [
      sheet({ stockId: 'stock:18', count: 1, costEachCents: 8900, free: 8 }),
      sheet({ stockId: 'stock:12', thickness: 12, nominalThickness: '1/2"', count: 1, costEachCents: 6850, free: 14 }),
      sheet({ stockId: 'stock:6', thickness: 6, nominalThickness: '1/4"', count: 1, costEachCents: 3900, free: 1 }),
    ];
    const { allowances, totals } = takeoff(sizes, 15);
    // 8900 × 0.15 = 1335; 6850 × 0.15 = 1027.5 → 1028; 3900 × 0.15 = 585: 2948 in all.
    expect(allowances.map((a) => a.allowanceCents)).toEqual([1335, 1028, 585]);
    expect(totals).toMatchObject({ costCents: 19650, allowanceCents: 2948, costWithAllowanceCents: 22598, covered: true });
    // 0.15 of a sheet more is still a whole sheet to have on hand; the 6 mm rack has only one free.
    expect(allowances.map((a) => [a.pieces, a.piecesReady, a.coveredReady])).toEqual([
      [1, 2, true],
      [1, 2, true],
      [1, 2, false],
    ]);
    expect(totals.coveredReady).toBe(false);
  });

  test('by hand: the allowance is taken once per material, over every size and offcut of it (3 × 32 ft² + a 4 ft² offcut)', () => {
    const big = sheet({
      stockId: 'stock:ply',
      material: 'Maple ply',
      length: inches(96),
      width: inches(48),
      count: 3,
      costEachCents: 9400,
      free: 3,
    });
    const offcut = sheet({
      stockId: 'offcut:1',
      source: 'offcut',
      kind: 'offcut',
      material: 'maple ply',
      nominalThickness: '',
      length: inches(24),
      width: inches(24),
      count: 1,
      costEachCents: 800,
      free: 1,
    });
    const { allowances, totals } = takeoff([big, offcut], 15);
    expect(allowances).toHaveLength(1);
    const [a] = allowances;
    // 100 ft² of maple ply; 15 % is 15 ft², under half a 32 ft² sheet: 3 + 1 = 4 sheets ready, and only 3 are free.
    expect(a.amount / FT2).toBeCloseTo(100, 9);
    expect(a.allowance / FT2).toBeCloseTo(15, 9);
    expect(a).toMatchObject({
      measure: 'area',
      stockId: 'stock:ply',
      pieces: 3,
      piecesReady: 4,
      coveredReady: false,
      costCents: 29000,
      allowanceCents: 4350,
    });
    expect(totals.areaMm2 / FT2).toBeCloseTo(100, 9);
  });

  test('AHEC board feet: 10 boards of 4 BF at 15 % are 6 BF more, 1.5 boards: 12 to have ready', () => {
    const [a] = takeoff([board({ count: 10, costEachCents: 3700, free: 11, heldByPlan: 1 })], 15).allowances;
    expect(a).toMatchObject({ measure: 'boardFeet', pieces: 10, piecesReady: 12, coveredReady: true, allowanceCents: 5550 });
    expect(a.allowance).toBeCloseTo(6, 9);
  });

  test('cover counts the stock room’s free pieces plus what the plan itself already holds', () => {
    const { lines } = takeoff([sheet({ count: 3, free: 1, heldByPlan: 2 }), sheet({ stockId: 'stock:x', count: 3, free: 2 })], 0);
    expect(lines.map((l) => l.covered)).toEqual([true, false]);
  });

  test('a plan on offcuts alone needs no new piece to be ready, and its allowance is still priced', () => {
    const offcut = sheet({ stockId: 'offcut:1', source: 'offcut', kind: 'offcut', count: 2, costEachCents: 1000, free: 2 });
    const [a] = takeoff([offcut], 10).allowances;
    expect(a).toMatchObject({ stockId: null, pieces: 0, piecesReady: 0, coveredReady: true, allowanceCents: 200 });
  });

  test('the priced allowance is the stated share of the cost, to the cent, and never fewer pieces than the plan uses', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({ count: fc.integer({ min: 1, max: 60 }), cents: fc.integer({ min: 0, max: 100_000 }), thick: fc.constantFrom(6, 12, 18) }),
          { minLength: 1, maxLength: 6 },
        ),
        fc.integer({ min: 0, max: 90 }),
        (rows, pct) => {
          const sizes = rows.map((r, i) => sheet({ stockId: `stock:${i}`, thickness: r.thick, count: r.count, costEachCents: r.cents }));
          const t = takeoff(sizes, pct);
          const exact = (t.totals.costCents * pct) / 100;
          expect(Math.abs(t.totals.allowanceCents - exact)).toBeLessThanOrEqual(0.5 * t.allowances.length);
          for (const a of t.allowances) expect(a.piecesReady).toBeGreaterThanOrEqual(a.pieces);
        },
      ),
      { seed: 20261202 },
    );
  });
});

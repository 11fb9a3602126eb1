import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { expectSane, expectSaneOrRefused } from '@/tests/support/sane';
import {
  currencyDigits,
  depositAndBalance,
  divideRounded,
  formatMoney,
  labourLines,
  lineCost,
  markupOn,
  percentOf,
  quoteTotals,
  toMinorUnits,
  type QuoteLineInput,
} from './index';

const SEED = 20261203;
const anyNumber = fc.oneof(
  fc.double(),
  fc.integer({ min: -5000, max: 5000 }),
  fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -1, 0, 0.005, 1e6, 1e12, 1e308, 5e-324),
);
const currency = fc.constantFrom('USD', 'JPY', 'KWD', 'EUR', 'GBP');

/** A sensible line: up to 50 of a thing (3 decimals) at up to 200,000 minor units, so 30 lines stay under the cap. */
const line: fc.Arbitrary<QuoteLineInput> = fc.record({
  kind: fc.constantFrom('material', 'hardware', 'labour', 'other'),
  quantity: fc.integer({ min: 0, max: 50_000 }).map((n) => n / 1000),
  unitCostMinor: fc.integer({ min: 0, max: 200_000 }),
  taxable: fc.boolean(),
});
const percent = (max: number) => fc.integer({ min: 0, max: max * 100 }).map((n) => n / 100);
const quote = fc.record({
  currency,
  lines: fc.array(line, { maxLength: 30 }),
  markupPercent: fc.record({ material: percent(200), hardware: percent(200) }),
  discount: fc.oneof(
    fc.record({ kind: fc.constant('percent' as const), percent: percent(100) }),
    fc.record({ kind: fc.constant('amount' as const), minor: fc.constant(0) }),
  ),
  taxPercent: percent(30),
  depositPercent: percent(100),
});

describe('quote totals (seeded properties)', () => {
  test('the subtotal is the sum of the rounded line prices, each price its cost plus markup; deposit + balance = total', () => {
    fc.assert(
      fc.property(quote, (q) => {
        const t = quoteTotals(q);
        expectSane(t);
        expect(t.subtotalMinor).toBe(t.lines.reduce((n, l) => n + l.priceMinor, 0));
        expect(t.costMinor).toBe(t.lines.reduce((n, l) => n + l.costMinor, 0));
        for (const l of t.lines) expect(l.priceMinor).toBe(l.costMinor + l.markupMinor);
        expect(t.totalMinor).toBe(t.subtotalMinor - t.discountMinor + t.taxMinor);
        expect(t.depositMinor + t.balanceMinor).toBe(t.totalMinor);
        expect(t.depositMinor).toBeGreaterThanOrEqual(0);
        expect(t.balanceMinor).toBeGreaterThanOrEqual(0);
        expect(t.taxableMinor).toBeGreaterThanOrEqual(0);
        expect(t.taxableMinor).toBeLessThanOrEqual(t.subtotalMinor - t.discountMinor);
        for (const n of [t.subtotalMinor, t.discountMinor, t.taxMinor, t.totalMinor, t.depositMinor]) expect(Number.isInteger(n)).toBe(true);
      }),
      { seed: SEED, numRuns: 1500 },
    );
  });

  test('the deposit is within half a minor unit of the exact percent of the total', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 10_000_000_000 }), percent(100), (total, p) => {
        const { depositMinor, balanceMinor } = depositAndBalance(total, p, 'USD');
        expect(Math.abs(depositMinor - (total * p) / 100)).toBeLessThanOrEqual(0.5 + 1e-6);
        expect(depositMinor + balanceMinor).toBe(total);
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });
});

describe('no public function of lib/costing returns a silent wrong number (seeded properties)', () => {
  test('money helpers: finite whole minor units or a RangeError, for any number', () => {
    fc.assert(
      fc.property(anyNumber, anyNumber, currency, (a, b, c) => {
        expectSaneOrRefused(
          () => toMinorUnits(a, c),
          (v) => expect(Number.isInteger(v) && v >= 0).toBe(true),
        );
        expectSaneOrRefused(() => formatMoney(a, c));
        expectSaneOrRefused(
          () => divideRounded(a, b),
          (v) => expect(Number.isInteger(v)).toBe(true),
        );
        expectSaneOrRefused(
          () => lineCost(a, b, c),
          (v) => expect(Number.isInteger(v) && v >= 0).toBe(true),
        );
        expectSaneOrRefused(
          () => markupOn(a, b, c),
          (v) => expect(Number.isInteger(v) && v >= 0).toBe(true),
        );
        expectSaneOrRefused(
          () => percentOf(a, b, 'A tax', c),
          (v) => expect(Number.isInteger(v) && v >= 0).toBe(true),
        );
        expectSaneOrRefused(
          () => depositAndBalance(a, b, c),
          (v) => expect(v.depositMinor + v.balanceMinor).toBe(a),
        );
      }),
      { seed: SEED, numRuns: 2000 },
    );
  });

  test('currency codes: digits or a RangeError, for any text', () => {
    fc.assert(
      fc.property(fc.oneof(fc.string({ maxLength: 5 }), fc.constantFrom('XYZ', 'usd', '', 'US', 'ZZZZ')), (code) => {
        expectSaneOrRefused(
          () => currencyDigits(code),
          (d) => expect([0, 2, 3, 4]).toContain(d),
        );
      }),
      { seed: SEED, numRuns: 500 },
    );
  });

  test('labour: finite hours or a RangeError, for any number in any count or rate', () => {
    const counts = { cuts: 46, piecesHandled: 9, setupCards: 2, jointCorners: 16, drawerBoxes: 4, faceAreaMm2: 6_437_000 };
    const rates = {
      minutesPerCut: 0.75,
      minutesPerPiece: 2.5,
      setupMinutesPerCard: 20,
      minutesPerJointCorner: 1.5,
      assemblyMinutesPerBox: 12,
      finishingMinutesPerM2: 9 as number | null,
    };
    fc.assert(
      fc.property(fc.constantFrom(...Object.keys(counts)), fc.constantFrom(...Object.keys(rates)), anyNumber, anyNumber, (ck, rk, a, b) => {
        expectSaneOrRefused(
          () => labourLines({ ...counts, [ck]: a }, { ...rates, [rk]: b }),
          (lines) => {
            for (const l of lines) expect(l.hours >= 0 && l.hours < 1e9).toBe(true);
          },
        );
      }),
      { seed: SEED, numRuns: 2000 },
    );
  });

  test('quote totals: a total or a RangeError, with any number anywhere', () => {
    const base = {
      currency: 'USD',
      lines: [
        { kind: 'material', quantity: 3, unitCostMinor: 6840, taxable: true },
        { kind: 'labour', quantity: 0.95, unitCostMinor: 6500, taxable: false },
      ],
      markupPercent: { material: 30, hardware: 20 },
      discount: { kind: 'percent', percent: 5 },
      taxPercent: 8.25,
      depositPercent: 50,
    };
    const paths: string[][] = [
      ['lines', '0', 'quantity'],
      ['lines', '0', 'unitCostMinor'],
      ['lines', '1', 'quantity'],
      ['markupPercent', 'material'],
      ['markupPercent', 'hardware'],
      ['discount', 'percent'],
      ['taxPercent'],
      ['depositPercent'],
    ];
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.constantFrom(...paths), anyNumber), { minLength: 1, maxLength: 3 }), (changes) => {
        const q = structuredClone(base) as Record<string, unknown>;
        for (const [path, value] of changes) {
          let node = q as Record<string, unknown>;
          for (const k of path.slice(0, -1)) node = node[k] as Record<string, unknown>;
          node[path[path.length - 1]] = value;
        }
        expectSaneOrRefused(
          () => quoteTotals(q as never),
          (t) => expect(t.depositMinor + t.balanceMinor).toBe(t.totalMinor),
        );
      }),
      { seed: SEED, numRuns: 1500 },
    );
    expectSaneOrRefused(() => quoteTotals(undefined as never));
  });

  test.each([
    ['a NaN quantity', () => lineCost(Number.NaN, 100, 'USD'), /finite/],
    ['a negative cost', () => lineCost(1, -5, 'USD'), /cannot be negative/],
    ['a tax over 100 %', () => percentOf(100, 150, 'A sales tax', 'USD'), /over 100/],
    ['a percent with three decimals', () => percentOf(100, 33.333, 'A deposit', 'USD'), /at most 2 decimals/],
    ['an amount of a trillion dollars', () => formatMoney(1e14, 'USD'), /slipped digit/],
    [
      'half a cut',
      () =>
        labourLines(
          { cuts: 0.5, piecesHandled: 0, setupCards: 0, jointCorners: 0, drawerBoxes: 0, faceAreaMm2: 0 },
          {
            minutesPerCut: 1,
            minutesPerPiece: 1,
            setupMinutesPerCard: 1,
            minutesPerJointCorner: 1,
            assemblyMinutesPerBox: 1,
            finishingMinutesPerM2: null,
          },
        ),
      /whole number/,
    ],
    [
      'a discount above the subtotal',
      () =>
        quoteTotals({
          currency: 'USD',
          lines: [{ kind: 'other', quantity: 1, unitCostMinor: 100, taxable: false }],
          markupPercent: { material: 0, hardware: 0 },
          discount: { kind: 'amount', minor: 101 },
          taxPercent: 0,
          depositPercent: 50,
        }),
      /more than the subtotal/,
    ],
    ['an unknown currency', () => formatMoney(100, 'XX1'), /three-letter/],
  ])('%s is refused, saying why', (_label, f, message) => {
    expect(f).toThrow(RangeError);
    expect(f).toThrow(message);
  });
});

import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { expectSaneOrRefused } from '@/tests/support/sane';
import { formatArea } from './format-area';
import { formatLength, precisionStepMm } from './format-length';
import { gcd, typesetFraction } from './fraction-glyphs';
import { inches, toInches } from './length';
import { lengthFromNumber, MAX_LENGTH_MM, MIN_LENGTH_MM, parseLength } from './parse-length';
import { roundToPrecision } from './round-to-precision';

const SEED = 20261202;
/** Any double at all: NaN, ±Infinity, −0, subnormals and the largest finite values included. */
const anyNumber = fc.oneof(
  fc.double(),
  fc.integer(),
  fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -1, 0, 1e308, 5e-324),
);
const goodUnits = fc.constantFrom(
  { system: 'imperial', precision: 16, feet: false } as const,
  { system: 'imperial', precision: 32, feet: true } as const,
  { system: 'metric', precision: 1, feet: false } as const,
  { system: 'metric', precision: 0.5, feet: false } as const,
);
const anyUnits = fc.oneof(
  goodUnits,
  fc.record({ system: fc.constantFrom('imperial', 'metric', 'cubits'), precision: anyNumber, feet: fc.boolean() }),
) as fc.Arbitrary<never>;

describe('no public function of lib/units returns a silent wrong number (seeded properties)', () => {
  test('inches and toInches: finite in, finite out; NaN and ±Infinity refused', () => {
    fc.assert(
      fc.property(anyNumber, (n) => {
        expectSaneOrRefused(() => inches(n));
        expectSaneOrRefused(() => toInches(n));
      }),
      { seed: SEED, numRuns: 500 },
    );
    expect(() => inches(Number.NaN)).toThrow(RangeError);
  });

  test('formatLength: a length in the shop’s unit, or refused — never "NaN mm" or "Infinity″"', () => {
    fc.assert(
      fc.property(anyNumber, anyUnits, fc.constantFrom('hyphen', 'unicode', 'ascii'), (mm, units, style) => {
        expectSaneOrRefused(
          () => formatLength(mm, units, { style }),
          (text) => expect(text).toMatch(/^[≈~]?[−-]?[\d¼½¾⅛⅜⅝⅞⁰¹²³⁴⁵⁶⁷⁸⁹][\d\-/ ′″'"¼½¾⅛⅜⅝⅞⁰¹²³⁴⁵⁶⁷⁸⁹⁄₀₁₂₃₄₅₆₇₈₉.]*( mm)?$/u),
        );
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });

  test('formatArea: a positive area in m² or ft², or refused — never "-1 m²"', () => {
    fc.assert(
      fc.property(anyNumber, anyUnits, fc.oneof(fc.integer({ min: -2, max: 8 }), anyNumber), (mm2, units, decimals) => {
        expectSaneOrRefused(
          () => formatArea(mm2, units, { decimals }),
          (text) => expect(text).toMatch(/^≈?\d+(\.\d+)? (m²|ft²)$/),
        );
      }),
      { seed: SEED, numRuns: 1000 },
    );
    expect(() => formatArea(-1_000_000, { system: 'metric', precision: 1, feet: false })).toThrow(/cannot be negative/);
  });

  test('roundToPrecision and precisionStepMm: finite or refused', () => {
    fc.assert(
      fc.property(anyNumber, anyNumber, anyUnits, (value, step, units) => {
        expectSaneOrRefused(() => roundToPrecision(value, step));
        expectSaneOrRefused(
          () => precisionStepMm(units),
          (s) => expect(s).toBeGreaterThan(0),
        );
      }),
      { seed: SEED, numRuns: 500 },
    );
  });

  test('gcd and typesetFraction: whole numbers only', () => {
    fc.assert(
      fc.property(anyNumber, anyNumber, (a, b) => {
        expectSaneOrRefused(
          () => gcd(a, b),
          (g) => expect(Number.isInteger(g) && g >= 0).toBe(true),
        );
        expectSaneOrRefused(() => typesetFraction(a, b));
      }),
      { seed: SEED, numRuns: 500 },
    );
  });

  test('parseLength and lengthFromNumber: a length from 0.5 mm to 100 m, or a message — for any text or number', () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.string(), fc.string({ unit: fc.constantFrom(...'0123456789 ./-,\'"′″¾e+∞NaInfity'.split('')) })),
        anyNumber,
        fc.constantFrom('in' as const, 'mm' as const),
        (text, n, unit) => {
          for (const parsed of [parseLength(text, { unit }), lengthFromNumber(n, unit)]) {
            if (parsed.ok) expect(parsed.mm >= MIN_LENGTH_MM && parsed.mm <= MAX_LENGTH_MM).toBe(true);
            else expect(parsed.error).not.toMatch(/NaN|Infinity|undefined/);
          }
        },
      ),
      { seed: SEED, numRuns: 1000 },
    );
  });
});

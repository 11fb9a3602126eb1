import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { roundToPrecision } from './round-to-precision';

describe('rounding to the shop’s step', () => {
  test.each([
    ['common practice, no source: 502.3 to 0.5 is 502.5', 502.3, 0.5, 502.5, false],
    ['common practice, no source: halves round away from zero', 2.5, 1, 3, false],
    ['common practice, no source: negative halves round away from zero too', -2.5, 1, -3, false],
    ['common practice, no source: a value on the grid is exact', 19.75, 1 / 16, 19.75, true],
    ['common practice, no source: float crumbs (501.65 / 25.4) still count as on the grid', 501.65 / 25.4, 1 / 16, 19.75, true],
  ])('%s', (_label, value, step, rounded, exact) => {
    expect(roundToPrecision(value, step)).toEqual({ value: expect.closeTo(rounded, 12), exact });
  });

  test('a step that is not a positive number is refused', () => {
    expect(() => roundToPrecision(1, 0)).toThrow(/positive/);
    expect(() => roundToPrecision(Number.NaN, 1)).toThrow(/round/);
  });

  test('the rounded value is a whole number of steps no further than half a step away', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }), fc.constantFrom(0.5, 1, 1 / 16, 1 / 32, 0.01), (value, step) => {
        const r = roundToPrecision(value, step);
        expect(Math.abs(r.value - value)).toBeLessThanOrEqual(step / 2 + 1e-9);
        expect(Math.abs(r.value / step - Math.round(r.value / step))).toBeLessThan(1e-6);
      }),
    );
  });
});

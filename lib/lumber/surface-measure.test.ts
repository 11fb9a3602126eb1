import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inches } from '@/lib/units/length';
import { tally } from './surface-measure';

const ft = (n: number) => inches(12 * n);

describe('the NHLA-style tally (AHEC "Measurement")', () => {
  test('AHEC: 2″ × 6¼″ × 8′ tallies SM 4 and 8 BF, against 8.33 BF exact', () => {
    expect(tally({ thickness: { quarters: 8 }, width: inches(6.25), length: ft(8) })).toEqual({
      widthIn: 6.25,
      lengthFt: 8,
      surfaceMeasure: 4,
      boardFeet: 8,
    });
  });

  test('AHEC: 10″ × 13′ has surface measure 10.83, tallied as 11', () => {
    expect(tally({ thickness: { quarters: 4 }, width: inches(10), length: ft(13) }).surfaceMeasure).toBe(11);
  });

  test.each([
    ['AHEC: length is rounded down to whole feet (8′ 11″ counts as 8′)', 10, 8 * 12 + 11, 8, 7],
    ['AHEC: SM from the measured width: 7.6″ × 10′ is 6.33, tallied 6 (rounding the width to 8″ first gave 7)', 7.6, 120, 10, 6],
    ['AHEC: SM from the measured width: 3⅝″ × 8′ is 2.42, tallied 2 (rounding the width to 4″ first gave 3)', 3.625, 96, 8, 2],
    ['AHEC: SM from the measured width: 6⅞″ × 14′ is 8.02, tallied 8 (rounding to 7″ first gave 8.17 → 8)', 6.875, 168, 14, 8],
    ['AHEC: SM 5.5 (11″ × 6′) rounds up on a single board', 11, 72, 6, 6],
    ['AHEC: SM 4.5 (4½″ × 12′) rounds up on a single board', 4.5, 144, 12, 5],
  ])('%s', (_label, widthIn, lengthIn, lengthFt, sm) => {
    const t = tally({ thickness: { quarters: 4 }, width: inches(widthIn), length: inches(lengthIn) });
    expect(t.lengthFt).toBe(lengthFt);
    expect(t.surfaceMeasure).toBe(sm);
  });

  test('the tally is the measured surface measure rounded half up, times the nominal thickness (3–12″ in ⅛″ steps, 8–16′)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 24, max: 96 }), fc.integer({ min: 8, max: 16 }), fc.constantFrom(4, 5, 6, 8, 12), (eighths, l, q) => {
        const w = eighths / 8;
        const t = tally({ thickness: { quarters: q }, width: inches(w), length: ft(l) });
        // By hand in exact eighths: SM × 96 = w × 8 × l, so SM rounds half up as ⌊(8wl + 48) / 96⌋.
        expect(t.surfaceMeasure).toBe(Math.floor((eighths * l + 48) / 96));
        expect(t.boardFeet).toBeCloseTo(t.surfaceMeasure * (q / 4), 12);
        expect(Math.abs(t.surfaceMeasure - (w * l) / 12)).toBeLessThanOrEqual(0.5);
      }),
      { seed: 20261202 },
    );
  });

  test.each([
    ['a negative count of quarters', { quarters: -4 }],
    ['a fraction of a quarter', { quarters: 1.5 }],
    ['zero quarters', { quarters: 0 }],
    ['a thickness of no millimetres', { mm: 0 }],
  ])('refuses %s', (_label, thickness) => {
    expect(() => tally({ thickness, width: inches(6), length: ft(8) })).toThrow(RangeError);
  });
});

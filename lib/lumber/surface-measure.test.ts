import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inches } from '@/lib/units/length';
import { tally } from './surface-measure';

const ft = (n: number) => inches(12 * n);

describe('the NHLA-style tally (AHEC "Measurement")', () => {
  test('AHEC: 2″ × 6¼″ × 8′ tallies SM 4 and 8 BF, against 8.33 BF exact', () => {
    expect(tally({ thickness: { quarters: 8 }, widthMm: inches(6.25), lengthMm: ft(8) })).toEqual({ widthIn: 6, lengthFt: 8, surfaceMeasure: 4, boardFeet: 8 });
  });

  test('AHEC: 10″ × 13′ has surface measure 10.83, tallied as 11', () => {
    expect(tally({ thickness: { quarters: 4 }, widthMm: inches(10), lengthMm: ft(13) }).surfaceMeasure).toBe(11);
  });

  test.each([
    ['AHEC: length is rounded down to whole feet (8′ 11″ counts as 8′)', 10, 8 * 12 + 11, 8, 7],
    ['AHEC: width is taken to the nearest inch (7.4″ counts as 7″)', 7.4, 120, 10, 6],
    ['AHEC: width is taken to the nearest inch (7.6″ counts as 8″)', 7.6, 120, 10, 7],
    ['AHEC: SM 5.5 (11″ × 6′) rounds up on a single board', 11, 72, 6, 6],
  ])('%s', (_label, widthIn, lengthIn, lengthFt, sm) => {
    const t = tally({ thickness: { quarters: 4 }, widthMm: inches(widthIn), lengthMm: inches(lengthIn) });
    expect(t.lengthFt).toBe(lengthFt);
    expect(t.surfaceMeasure).toBe(sm);
  });

  test('the tally is a whole surface measure times the nominal thickness, never more than half an SM off the rounded-dimension volume', () => {
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 24 }), fc.integer({ min: 4, max: 16 }), fc.constantFrom(4, 5, 6, 8, 12), (w, l, q) => {
        const t = tally({ thickness: { quarters: q }, widthMm: inches(w), lengthMm: ft(l) });
        expect(Number.isInteger(t.surfaceMeasure)).toBe(true);
        expect(t.boardFeet).toBeCloseTo(t.surfaceMeasure * (q / 4), 12);
        expect(Math.abs(t.surfaceMeasure - (w * l) / 12)).toBeLessThanOrEqual(0.5);
      }),
    );
  });
});

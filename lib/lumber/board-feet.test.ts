import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inches } from '@/lib/units/length';
import type { Thickness } from '@/shared/schemas/lumber';
import { BOARD_FEET_PER_CUBIC_METRE, boardFeet, boardFeetToCubicMetres, cubicMetres, cubicMetresToBoardFeet, MM3_PER_BOARD_FOOT } from './board-feet';
import { thicknessInches } from './thickness';

const ft = (n: number) => inches(12 * n);

describe('board feet by exact volume', () => {
  test.each([
    ['AHEC "Measurement", arithmetic from the definition: 4/4 × 6″ × 8′ = 4.0 BF', { quarters: 4 }, 6, 8, 4],
    ['AHEC "Measurement", arithmetic from the definition: 8/4 × 7″ × 10′ = 11.667 BF', { quarters: 8 }, 7, 10, 11.667],
    ['AHEC "Measurement": 2″ × 6¼″ × 8′ is 8.33 BF by exact volume', { quarters: 8 }, 6.25, 8, 8.333],
    ['AHEC "Measurement": one board foot is 12″ × 12″ × 1″', { mm: inches(1) }, 12, 1, 1],
  ] as const)('%s', (_label, thickness: Thickness, widthIn, lengthFt, expected) => {
    expect(boardFeet({ thickness, width: inches(widthIn), length: ft(lengthFt) })).toBeCloseTo(expected, 3);
  });

  test.each([
    ['AHEC; hardwood trade practice: 4/4 = 1″', 4, 1],
    ['AHEC; hardwood trade practice: 5/4 = 1¼″', 5, 1.25],
    ['AHEC; hardwood trade practice: 6/4 = 1½″', 6, 1.5],
    ['AHEC; hardwood trade practice: 8/4 = 2″', 8, 2],
    ['AHEC; hardwood trade practice: 12/4 = 3″', 12, 3],
  ])('%s', (_label, quarters, expected) => {
    expect(thicknessInches({ quarters })).toBe(expected);
  });

  test('derived from 25.4 mm exactly: one cubic metre is 423.776 board feet', () => {
    expect(MM3_PER_BOARD_FOOT).toBeCloseTo(2_359_737.216, 6);
    expect(BOARD_FEET_PER_CUBIC_METRE).toBeCloseTo(423.776, 3);
    expect(cubicMetresToBoardFeet(1)).toBeCloseTo(423.776, 3);
  });

  test('a 1 m × 1 m × 1 m block is one cubic metre and 423.776 BF', () => {
    const block = { thickness: { mm: 1000 }, width: 1000, length: 1000 };
    expect(cubicMetres(block)).toBeCloseTo(1, 12);
    expect(boardFeet(block)).toBeCloseTo(423.776, 3);
  });

  test.each([[{ quarters: 1.5 }], [{ quarters: -4 }], [{ quarters: 0 }], [{ mm: -3 }], [{ mm: Number.NaN }]])(
    'refuses the thickness %j',
    (thickness) => {
      expect(() => boardFeet({ thickness, width: inches(6), length: ft(8) })).toThrow(RangeError);
    },
  );

  test('a board with no width is refused rather than counted as nothing', () => {
    expect(() => boardFeet({ thickness: { quarters: 4 }, width: 0, length: 100 })).toThrow(/width must be a positive/);
  });

  test('board feet and cubic metres convert both ways without loss, and scale with each dimension', () => {
    const dim = fc.double({ min: 1, max: 5000, noNaN: true });
    const thick = fc.double({ min: 1, max: 1000, noNaN: true }); // past a metre a thickness is refused as a slipped unit
    fc.assert(
      fc.property(thick, dim, dim, fc.integer({ min: 1, max: 5 }), (t, w, l, k) => {
        const board = { thickness: { mm: t }, width: w, length: l };
        expect(boardFeetToCubicMetres(boardFeet(board))).toBeCloseTo(cubicMetres(board), 9);
        expect(boardFeet({ ...board, length: l * k }) / boardFeet(board)).toBeCloseTo(k, 9);
      }),
      { seed: 20261202 },
    );
  });
});

import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { costEachCents, pieceBoardFeet } from './pricing';

const board = (nominalThickness: string, widthIn: number, lengthIn: number, costCents: number, thickness = inches(13 / 16)) => ({
  kind: 'board' as const,
  nominalThickness,
  thickness,
  width: inches(widthIn),
  length: inches(lengthIn),
  costCents,
});

describe('the cost of a piece of stock', () => {
  test.each([
    // AHEC "Measurement": BF = T × W × L(ft) / 12. 4/4 × 6½″ × 8′ = 4.333 BF; at $9.25/bf → $40.08.
    ['4/4', 6.5, 96, 925, 4008],
    // 8/4 × 7″ × 10′ = 11.667 BF; at $10.00/bf → $116.67.
    ['8/4', 7, 120, 1000, 11667],
  ])('a %s board %f″ wide and %f″ long at %i¢/bf costs %i¢', (nominal, w, l, perBf, expected) => {
    expect(costEachCents(board(nominal, w, l, perBf))).toBe(expected);
  });

  test('a quartered board is measured on its nominal thickness, anything else on its actual one (1″ = 25.4 mm, NIST)', () => {
    expect(pieceBoardFeet(board('4/4', 12, 12, 0))).toBeCloseTo(1, 12);
    expect(pieceBoardFeet(board('1"', 12, 12, 0, 25.4 * 2))).toBeCloseTo(2, 12);
  });

  test('a sheet costs its price each', () => {
    expect(costEachCents({ kind: 'sheet', nominalThickness: '3/4"', thickness: 18, length: 2440, width: 1220, costCents: 8900 })).toBe(8900);
  });
});

import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { boardFootCost, pricePerBoardFootFromCubicMetre } from './board-cost';
import { buyQuantity } from './buy-quantity';

describe('how much to buy for a waste factor', () => {
  test('derived from buy = need / (1 − waste): 100 needed at 30 % waste is 100 / 0.7 = 142.86, bought as 143', () => {
    expect(buyQuantity(100, 0.3)).toEqual({ exact: expect.closeTo(142.857, 3), buy: 143 });
  });

  test('[derived] a quotient that is whole up to float crumbs is not bumped a unit: 70 / 0.7 buys 100', () => {
    expect(buyQuantity(70, 0.3).buy).toBe(100);
  });

  test('[derived] buying in half board feet rounds up to the half', () => {
    expect(buyQuantity(10, 0.25, { step: 0.5 }).buy).toBe(13.5);
  });

  test('a waste factor of 1 or more, or below 0, is refused', () => {
    expect(() => buyQuantity(100, 1)).toThrow(/below 1/);
    expect(() => buyQuantity(100, -0.1)).toThrow(/from 0/);
  });

  test('what is bought, less its waste, always covers the need', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e5, noNaN: true }), fc.double({ min: 0, max: 0.9, noNaN: true }), (need, waste) => {
        const { buy } = buyQuantity(need, waste);
        expect(buy * (1 - waste)).toBeGreaterThanOrEqual(need - 1e-6);
        expect(buy - 1).toBeLessThan(need / (1 - waste) + 1e-6);
      }),
    );
  });
});

describe('cost by the board foot', () => {
  test('[derived] 143 BF at $8.50 is $1215.50', () => {
    expect(boardFootCost(143, 8.5)).toBeCloseTo(1215.5, 9);
  });

  test('derived from 1 m³ = 423.776 BF: a price per m³ divides by 423.776 BF', () => {
    expect(pricePerBoardFootFromCubicMetre(1000)).toBeCloseTo(1000 / 423.776, 4);
  });

  test('a negative price is refused', () => {
    expect(() => boardFootCost(10, -1)).toThrow(/zero or more/);
  });
});

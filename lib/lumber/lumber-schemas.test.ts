import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { boardSchema, buyQuantityInputSchema, movementInputSchema, thicknessInput, thicknessSchema } from '@/shared/schemas/lumber';

describe('lumber input schemas', () => {
  test('AHEC; hardwood trade practice: a thickness typed as 5/4 is five quarters, in either kind of shop', () => {
    expect(thicknessInput('in').parse('5/4')).toEqual({ quarters: 5 });
    expect(thicknessInput('mm').parse(' 8 / 4 ')).toEqual({ quarters: 8 });
  });

  test('any other thickness is a length in the shop’s unit (NIST SP 811: 13/16″ = 20.6375 mm)', () => {
    expect(thicknessInput('in').parse('13/16"')).toEqual({ mm: expect.closeTo(20.6375, 9) });
    expect(thicknessInput('mm').parse('21')).toEqual({ mm: 21 });
    expect(thicknessInput('in').parse(0.75)).toEqual({ mm: expect.closeTo(inches(0.75), 9) });
  });

  test('a bad thickness says why', () => {
    expect(thicknessInput('in').safeParse('0/4').error?.issues[0].message).toMatch(/at least 1\/4/i);
    expect(thicknessInput('in').safeParse('3/0').error?.issues[0].message).toMatch(/denominator/);
    expect(thicknessSchema.safeParse({ quarters: 4.5 }).success).toBe(false);
    expect(thicknessSchema.safeParse({ quarters: 4, mm: 25 }).success).toBe(false);
  });

  test('a board needs positive width and length', () => {
    expect(boardSchema.safeParse({ thickness: { quarters: 4 }, width: 150, length: 2400 }).success).toBe(true);
    expect(boardSchema.safeParse({ thickness: { quarters: 4 }, width: -1, length: 2400 }).error?.issues[0].message).toMatch(
      /width must be greater than zero/,
    );
  });

  test('a waste factor is a fraction below 1', () => {
    expect(buyQuantityInputSchema.safeParse({ need: 100, waste: 0.3 }).success).toBe(true);
    expect(buyQuantityInputSchema.safeParse({ need: 100, waste: 30 }).error?.issues[0].message).toMatch(/0\.3 for 30 %/);
  });

  test('movement input names a listed species, a cut and moisture contents up to fibre saturation', () => {
    const ok = { species: 'red-oak', width: 300, cut: 'flatsawn', mcFrom: 6, mcTo: 10, fixedAcrossWidth: true };
    expect(movementInputSchema.safeParse(ok).success).toBe(true);
    expect(movementInputSchema.safeParse({ ...ok, species: 'balsa' }).error?.issues[0].message).toMatch(/one of: red-oak/);
    expect(movementInputSchema.safeParse({ ...ok, cut: 'rift' }).error?.issues[0].message).toMatch(/flatsawn.*quartersawn/);
    expect(movementInputSchema.safeParse({ ...ok, mcTo: 45 }).error?.issues[0].message).toMatch(/fibre saturation/);
  });
});

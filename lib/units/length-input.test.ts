import { describe, expect, test } from 'vitest';
import { lengthInput, shopUnitsSchema } from '@/shared/schemas/units';

describe('the length field schema', () => {
  test('it turns typed text into mm with the parser (NIST SP 811: 19-3/4″ = 501.65 mm)', () => {
    expect(lengthInput('in').parse('19-3/4″')).toBeCloseTo(501.65, 9);
    expect(lengthInput('mm').parse('50.2 cm')).toBeCloseTo(502, 9);
  });

  test('it reads a number in the shop’s unit', () => {
    expect(lengthInput('in').parse(2)).toBeCloseTo(50.8, 9);
    expect(lengthInput('mm').parse(502)).toBe(502);
  });

  test('it carries the parser’s message as its own', () => {
    const result = lengthInput('in').safeParse('3/0');
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].message).toMatch(/denominator at character 3 is 0/);
  });

  test('it refuses a non-positive or non-finite number and anything that is not text or a number', () => {
    expect(lengthInput('mm').safeParse(0).error?.issues[0].message).toMatch(/greater than zero/);
    expect(lengthInput('mm').safeParse(Number.POSITIVE_INFINITY).success).toBe(false);
    expect(lengthInput('mm').safeParse(null).error?.issues[0].message).toBe('Enter a length.');
  });
});

describe('the shop units schema', () => {
  test('it accepts the four shop settings and defaults feet to off', () => {
    expect(shopUnitsSchema.parse({ system: 'imperial', precision: 16 })).toEqual({ system: 'imperial', precision: 16, feet: false });
    expect(shopUnitsSchema.parse({ system: 'imperial', precision: 32, feet: true }).feet).toBe(true);
    expect(shopUnitsSchema.parse({ system: 'metric', precision: 0.5 }).precision).toBe(0.5);
    expect(shopUnitsSchema.parse({ system: 'metric', precision: 1 }).precision).toBe(1);
  });

  test('it refuses a precision from the other system with a specific message', () => {
    expect(shopUnitsSchema.safeParse({ system: 'imperial', precision: 1 }).error?.issues[0].message).toMatch(/16 or 32/);
    expect(shopUnitsSchema.safeParse({ system: 'metric', precision: 16 }).error?.issues[0].message).toMatch(/0\.5 or 1/);
    expect(shopUnitsSchema.safeParse({ system: 'furlongs', precision: 1 }).error?.issues[0].message).toMatch(/imperial.*metric/);
  });
});

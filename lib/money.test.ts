import { describe, expect, test } from 'vitest';
import { formatMoney } from './money';

describe('formatMoney (minor units in the shop’s currency; decimals per ISO 4217 through Intl)', () => {
  test('cents, yen and fils', () => {
    expect(formatMoney(197500, 'USD')).toBe('$1,975.00');
    expect(formatMoney(1975, 'JPY')).toBe('¥1,975');
    expect(formatMoney(12345, 'KWD')).toMatch(/12\.345/);
  });
  test('a fraction of a cent (an area share) rounds half up; NaN is refused, never printed', () => {
    expect(formatMoney(1234.5, 'USD')).toBe('$12.35');
    expect(() => formatMoney(Number.NaN, 'USD')).toThrow(RangeError);
  });
});

import { describe, expect, test } from 'vitest';
import { formatShopDateTime, isTimeZone, periodStart, shopDay, timeZoneChoices } from './shop-time';

describe('dates on the shop’s clock', () => {
  test('23:30 on 30 November in Chicago (CST, UTC−6) is 05:30 UTC on 1 December: still November for the shop', () => {
    // The offset: US Central Standard Time is UTC−6 in winter (tz database, America/Chicago).
    const at = new Date('2026-12-01T05:30:00Z');
    expect(shopDay(at, 'America/Chicago')).toBe('2026-11-30');
    expect(shopDay(at, 'UTC')).toBe('2026-12-01');
    expect(periodStart(shopDay(at, 'America/Chicago'), 'month')).toBe('2026-11-01');
    expect(formatShopDateTime(at, 'America/Chicago')).toBe('Nov 30, 2026, 11:30 PM');
  });

  test('weeks start on Monday (ISO 8601): Sunday 2026-11-29 belongs to the week of Monday 2026-11-23', () => {
    expect(periodStart('2026-11-29', 'week')).toBe('2026-11-23');
    expect(periodStart('2026-11-30', 'week')).toBe('2026-11-30');
    expect(periodStart('2027-01-01', 'week')).toBe('2026-12-28'); // a week across the new year
    expect(periodStart('2026-02-28', 'month')).toBe('2026-02-01');
  });

  test('only real IANA zones are accepted', () => {
    expect(isTimeZone('America/Chicago')).toBe(true);
    expect(isTimeZone('UTC')).toBe(true);
    expect(isTimeZone('Europe/Berlin')).toBe(true);
    for (const bad of ['', 'Mars/Olympus', 'CST6CDT; drop table', '../etc', 'America/']) expect(isTimeZone(bad)).toBe(false);
    expect(timeZoneChoices()[0]).toBe('UTC');
    expect(timeZoneChoices()).toContain('America/Chicago');
  });

  test('bad days and dates are refused, not turned into NaN', () => {
    expect(() => shopDay(new Date(Number.NaN), 'UTC')).toThrow(RangeError);
    expect(() => periodStart('2026-13', 'week')).toThrow(RangeError);
  });
});

test('the periods of a range: months from the first month to the last, weeks from Monday to Monday', async () => {
  const { periodsBetween } = await import('./shop-time');
  expect(periodsBetween('2026-11-15', '2027-01-02', 'month')).toEqual(['2026-11-01', '2026-12-01', '2027-01-01']);
  expect(periodsBetween('2026-11-29', '2026-12-08', 'week')).toEqual(['2026-11-23', '2026-11-30', '2026-12-07']);
  expect(periodsBetween('2026-11-01', '2026-11-01', 'month')).toEqual(['2026-11-01']);
});

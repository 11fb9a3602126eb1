import { describe, expect, test } from 'vitest';
import { digestDue, digestSizes, shopClock } from './digest';

// Offsets from the IANA tz database (America/Chicago: CST UTC−6; CDT UTC−5 from 2 a.m. on the second Sunday of
// March, 2026-03-08, to 2 a.m. on the first Sunday of November, 2026-11-01). Figures worked by hand.
const at = (iso: string) => new Date(iso);

describe('the shop’s clock', () => {
  test('Chicago reads 06:59 at 12:59Z in winter (CST) and at 11:59Z in summer (CDT)', () => {
    expect(shopClock(at('2026-03-07T12:59:00Z'), 'America/Chicago')).toEqual({ day: '2026-03-07', time: '06:59' });
    expect(shopClock(at('2026-03-09T11:59:00Z'), 'America/Chicago')).toEqual({ day: '2026-03-09', time: '06:59' });
  });

  test('05:30Z is still the evening before in Chicago (23:30 CST)', () => {
    expect(shopClock(at('2026-12-04T05:30:00Z'), 'America/Chicago')).toEqual({ day: '2026-12-03', time: '23:30' });
  });
});

describe('when the low-stock digest is due (07:00 in America/Chicago)', () => {
  const chicago = (iso: string, lastDay: string | null = null, time = '07:00') =>
    digestDue({ now: at(iso), zone: 'America/Chicago', at: time, lastDay });

  test('the day before the clocks change (CST): not at 06:59 local (12:59Z), due at 07:00 (13:00Z)', () => {
    expect(chicago('2026-03-07T12:59:00Z')).toEqual({ due: false, day: '2026-03-07' });
    expect(chicago('2026-03-07T13:00:00Z')).toEqual({ due: true, day: '2026-03-07' });
  });

  test('on the day the clocks go forward (CDT from 02:00): 07:00 local is 12:00Z, an hour earlier in UTC', () => {
    expect(chicago('2026-03-08T11:59:00Z')).toEqual({ due: false, day: '2026-03-08' });
    expect(chicago('2026-03-08T12:00:00Z')).toEqual({ due: true, day: '2026-03-08' });
  });

  test('a digest time inside the skipped hour (02:30 on 2026-03-08) goes at 03:00 CDT (08:00Z), the first minute after', () => {
    // 07:59Z is 01:59 CST; the next minute, 08:00Z, is 03:00 CDT.
    expect(chicago('2026-03-08T07:59:00Z', null, '02:30').due).toBe(false);
    expect(chicago('2026-03-08T08:00:00Z', null, '02:30').due).toBe(true);
  });

  test('once a day: not again the same local day, due again the next local day', () => {
    expect(chicago('2026-03-08T20:00:00Z', '2026-03-08').due).toBe(false);
    // 05:30Z on the 9th is still 00:30 CDT on the 9th: the 9th's digest waits for 07:00.
    expect(chicago('2026-03-09T05:30:00Z', '2026-03-08').due).toBe(false);
    expect(chicago('2026-03-09T12:00:00Z', '2026-03-08')).toEqual({ due: true, day: '2026-03-09' });
  });

  test('late evening: 23:30 local on the 3rd (05:30Z on the 4th) is still the 3rd: due when the 3rd had none', () => {
    expect(chicago('2026-12-04T05:30:00Z', '2026-12-02')).toEqual({ due: true, day: '2026-12-03' });
    expect(chicago('2026-12-04T05:30:00Z', '2026-12-03').due).toBe(false);
  });

  test("a shop that sends none (time '') is never due", () => {
    expect(chicago('2026-03-08T20:00:00Z', null, '').due).toBe(false);
  });
});

describe('what the digest lists', () => {
  test('sizes at or below their mark and on no open order', () => {
    const sizes = [
      { id: 'low', onHand: 2, reserved: 0, lowStockAt: 3 },
      { id: 'ordered', onHand: 1, reserved: 0, lowStockAt: 3 },
      { id: 'fine', onHand: 8, reserved: 2, lowStockAt: 3 },
      { id: 'reserved-low', onHand: 8, reserved: 6, lowStockAt: 3 },
      { id: 'unwatched', onHand: 0, reserved: 0, lowStockAt: 0 },
    ];
    expect(digestSizes(sizes, new Set(['ordered'])).map((s) => s.id)).toEqual(['low', 'reserved-low']);
  });
});

import { describe, expect, test } from 'vitest';
import { reportQuerySchema, reportRange } from './report';

const NOW = new Date('2026-12-01T05:30:00Z'); // 23:30 on 30 November in Chicago

describe('a report’s filters from its URL', () => {
  test('a bare URL shows the last twelve months to today on the shop’s clock (still 30 November in Chicago)', () => {
    const q = reportQuerySchema.parse({});
    expect(reportRange(q, 'America/Chicago', NOW)).toEqual({ from: '2025-12-01', to: '2026-11-30', by: 'month' });
    expect(reportRange(q, 'UTC', NOW)).toEqual({ from: '2026-01-01', to: '2026-12-01', by: 'month' });
  });

  test('by week: twelve weeks back, from a Monday', () => {
    const q = reportQuerySchema.parse({ by: 'week' });
    // 30 Nov 2026 is a Monday; 84 days before is Monday 7 September.
    expect(reportRange(q, 'America/Chicago', NOW)).toEqual({ from: '2026-09-07', to: '2026-11-30', by: 'week' });
  });

  test('bad days are named, a backwards range is refused, empty fields mean the default', () => {
    expect(reportQuerySchema.safeParse({ from: '2026-02-30' }).error?.issues[0].message).toBe('That day is not on the calendar.');
    expect(reportQuerySchema.safeParse({ to: '30/11/2026' }).error?.issues[0].message).toMatch(/YYYY-MM-DD/);
    expect(reportQuerySchema.safeParse({ by: 'year' }).success).toBe(false);
    expect(reportRange(reportQuerySchema.parse({ from: '2026-12-01', to: '2026-11-01' }), 'UTC', NOW)).toEqual({
      error: 'The range runs backwards: 2026-12-01 is after 2026-11-01.',
    });
    expect(reportQuerySchema.parse({ from: '', to: '', material: '' })).toEqual({ by: 'month', from: undefined, to: undefined, material: undefined });
  });
});

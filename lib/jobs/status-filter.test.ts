import { describe, expect, test } from 'vitest';
import { JOB_STATUSES } from '@/shared/schemas/job';
import { jobInStatusFilter, readStatusFilter } from './status-filter';

// Filed-away work leaves the day's list but can be found again (common practice, no source).
describe('the jobs list status filter', () => {
  test('by default shows every job but the archived ones', () => {
    expect(JOB_STATUSES.filter((s) => jobInStatusFilter(s, ''))).toEqual([
      'quoting',
      'quoted',
      'accepted',
      'deposit-paid',
      'cutting',
      'done',
      'declined',
      'expired',
    ]);
  });

  test('"archived" shows only those, one status only that one, "all" every job', () => {
    expect(JOB_STATUSES.filter((s) => jobInStatusFilter(s, 'archived'))).toEqual(['archived']);
    expect(JOB_STATUSES.filter((s) => jobInStatusFilter(s, 'accepted'))).toEqual(['accepted']);
    expect(JOB_STATUSES.filter((s) => jobInStatusFilter(s, 'all'))).toEqual([...JOB_STATUSES]);
  });

  test('a status in the URL that is not one reads as the default', () => {
    expect(readStatusFilter('shipped')).toBe('');
    expect(readStatusFilter(null)).toBe('');
    expect(readStatusFilter('archived')).toBe('archived');
  });
});

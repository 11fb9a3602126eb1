import { describe, expect, test } from 'vitest';
import { PART_FIELDS, REQUIRED_UPLOAD_FIELDS, SCHEDULE_OWNED_KEYS, UPLOAD_FIELDS } from '@/shared/part-fields';
import { fieldForHeader } from './column-mapping';
import { cutListCsv } from './export-csv';

describe('the part fields table', () => {
  test('each field has its own key, title and header word', () => {
    for (const k of ['key', 'title', 'csv'] as const) expect(new Set(PART_FIELDS.map((f) => f[k])).size).toBe(PART_FIELDS.length);
    expect(REQUIRED_UPLOAD_FIELDS.every((f) => UPLOAD_FIELDS.includes(f))).toBe(true);
    // Notes are the cutter's own words on a schedule's row; everything that sizes the part is the schedule's.
    expect(SCHEDULE_OWNED_KEYS).not.toContain('notes');
    expect(SCHEDULE_OWNED_KEYS).toContain('length');
  });

  test('the exported header is read back by the upload as the same fields, in the same order', () => {
    const csv = cutListCsv([], { system: 'imperial', precision: 16, feet: false });
    const header = csv.split('\r\n')[0].split(',');
    expect(header.slice(0, -1).map(fieldForHeader)).toEqual(UPLOAD_FIELDS);
    expect(header.at(-1)).toBe('Drawer schedule');
  });
});

import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import type { ShopUnits } from '@/shared/schemas/units';
import { guessMapping } from './column-mapping';
import { cutListCsv, type ExportPart } from './export-csv';
import { toUploadRows } from './upload-rows';
import { validateUploadRows } from './validate-rows';

const IMPERIAL: ShopUnits = { system: 'imperial', precision: 16, feet: false };
const METRIC: ShopUnits = { system: 'metric', precision: 1, feet: false };
const part = (over: Partial<ExportPart> = {}): ExportPart => ({
  label: 'Drawer side',
  quantity: 8,
  length: inches(19.75),
  width: inches(5.5),
  thickness: inches(0.5),
  material: 'Baltic birch',
  grain: 'along-length',
  jointAllowance: 0,
  notes: '',
  ...over,
});
const cells = (csv: string) => Papa.parse<string[]>(csv.trim()).data;

describe('exporting the cut list to CSV', () => {
  test('lengths are in the shop’s unit with plain quotes, one row per part, with the header words the upload reads', () => {
    const rows = cells(cutListCsv([part({ schedule: 'Kitchen drawers', jointAllowance: inches(0.25) })], IMPERIAL));
    expect(rows[0]).toEqual([
      'Part',
      'Quantity',
      'Length (in)',
      'Width (in)',
      'Thickness (in)',
      'Material',
      'Grain',
      'Joint allowance (in)',
      'Notes',
      'Drawer schedule',
    ]);
    expect(rows[1]).toEqual(['Drawer side', '8', '19-3/4"', '5-1/2"', '1/2"', 'Baltic birch', 'along', '1/4"', '', 'Kitchen drawers']);
  });

  test('every length is in its column’s unit: off the 1/32″ grid an inch shop gets decimal inches, not mm (355.41 mm = 13.9925″, NIST 25.4 mm/in)', () => {
    const rows = cells(cutListCsv([part({ length: 355.41, width: 18, thickness: 12, jointAllowance: 4.7625 })], IMPERIAL));
    expect(rows[0].slice(2, 5)).toEqual(['Length (in)', 'Width (in)', 'Thickness (in)']);
    expect(rows[1].slice(2, 5)).toEqual(['13.9925"', '0.7087"', '0.4724"']);
    // 4.7625 mm is exactly 3/16″.
    expect(rows[1][7]).toBe('3/16"');
    for (const cell of [...rows[1].slice(2, 5), rows[1][7]]) expect(cell).not.toMatch(/mm/);
  });

  test('a metric shop’s columns hold millimetres', () => {
    const rows = cells(cutListCsv([part({ length: 355.41, width: inches(0.5) })], METRIC));
    expect(rows[0][2]).toBe('Length (mm)');
    expect(rows[1].slice(2, 4)).toEqual(['355.41 mm', '12.7 mm']);
  });

  // OWASP, "CSV Injection": cells starting with = + - @ tab or carriage return are prefixed with a single quote.
  test.each([['=HYPERLINK("http://example.invalid")'], ['+1+1'], ['-2+3'], ['@SUM(A1:A2)'], ['\t=1+1'], ['\r=1+1'], ['=1+1\nsecond line']])(
    'a cell %j is neutralised with a leading quote (OWASP CSV Injection)',
    (evil) => {
      const rows = cells(cutListCsv([part({ label: evil, notes: evil, material: evil })], METRIC));
      for (const value of [rows[1][0], rows[1][5], rows[1][8]]) expect(value).toBe(`'${evil}`);
    },
  );

  test('harmless text that merely contains = or - is left alone', () => {
    const rows = cells(cutListCsv([part({ label: 'Side A-B', notes: 'x=2' })], METRIC));
    expect(rows[1][0]).toBe('Side A-B');
    expect(rows[1][8]).toBe('x=2');
  });

  test('an export reads back through the upload to the same parts (to the shop’s precision)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            label: fc
              .string({ minLength: 1, maxLength: 20 })
              .filter((s) => s.trim() === s && s.length > 0 && !/^[=+\-@\t\r]/.test(s) && !/[\u0000-\u001F\u007F]/.test(s)),
            quantity: fc.integer({ min: 1, max: 50 }),
            length: fc.integer({ min: 20, max: 2400 }),
            width: fc.integer({ min: 20, max: 1200 }),
            thickness: fc.constantFrom(6, 12, 18, 25),
            grain: fc.constantFrom('along-length' as const, 'any' as const),
          }),
          { minLength: 1, maxLength: 8 },
        ),
        (parts) => {
          const csv = cutListCsv(
            parts.map((p) => part({ ...p, material: 'MDF' })),
            METRIC,
          );
          const grid = cells(csv);
          const upload = toUploadRows(grid, guessMapping(grid[0]), { hasHeader: true });
          const report = validateUploadRows({ ...upload, unit: 'mm' });
          expect(report.invalidCount).toBe(0);
          expect(report.valid.map((v) => v.part)).toEqual(parts.map((p) => ({ ...p, material: 'MDF', jointAllowance: 0, notes: '' })));
        },
      ),
    );
  });
});

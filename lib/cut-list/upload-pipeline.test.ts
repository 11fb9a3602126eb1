import fs from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { guessMapping, looksLikeHeader } from './column-mapping';
import { detectUnit } from './detect-unit';
import { UPLOAD_LIMITS } from './limits';
import { readCutListFile } from './read-cut-list-file';
import { toUploadRows } from './upload-rows';
import { validateUploadRows } from './validate-rows';

const bytes = (text: string) => new TextEncoder().encode(text).buffer as ArrayBuffer;
const fixture = (name: string) => {
  const b = fs.readFileSync(path.join(import.meta.dirname, 'fixtures', name));
  return b.buffer.slice(b.byteOffset, b.byteOffset + b.byteLength) as ArrayBuffer;
};

/** Reads, maps by header, and validates a file the way the upload screen does. */
async function pipeline(name: string, data: ArrayBuffer, unit?: 'in' | 'mm') {
  const read = await readCutListFile({ name, bytes: data });
  if (!read.ok) throw new Error(read.error);
  const mapping = guessMapping(read.grid[0]);
  const upload = toUploadRows(read.grid, mapping, { hasHeader: looksLikeHeader(read.grid[0]) });
  const at = (f: string) => upload.columns.indexOf(f as never);
  const guess = detectUnit({
    lengths: upload.rows.flatMap((r) => [r.cells[at('length')] ?? '', r.cells[at('width')] ?? '']),
    thicknesses: upload.rows.map((r) => r.cells[at('thickness')] ?? ''),
  });
  return { upload, guess, report: validateUploadRows({ ...upload, unit: unit ?? guess.unit ?? 'mm' }) };
}

const GOOD_IMPERIAL_CSV = [
  'Part,Qty,Length,Width,Thickness,Material,Grain,Joint allowance,Notes',
  'Drawer side,8,19-3/4,5 1/2,1/2,Baltic birch,along,1/4,lock rabbet',
  'Drawer bottom,4,"13-7/16""","20-15/16""",1/4,Maple ply,any,,',
  'Face frame stile,2,1\' 9",1-1/2,13/16,White oak,,,',
  '',
].join('\r\n');

describe('reading a good file', () => {
  test('an imperial CSV with fractions, inch marks and feet gives every part in mm (25.4 mm to the inch, NIST SP 811)', async () => {
    const { report, guess, upload } = await pipeline('cabinets.csv', bytes(GOOD_IMPERIAL_CSV));
    expect(guess.unit).toBe('in');
    expect(upload.rows.map((r) => r.line)).toEqual([2, 3, 4]);
    expect(report.invalidCount).toBe(0);
    const [side, bottom, stile] = report.valid.map((v) => v.part);
    expect(side).toMatchObject({ label: 'Drawer side', quantity: 8, material: 'Baltic birch', grain: 'along-length', notes: 'lock rabbet' });
    expect(side.length).toBeCloseTo(inches(19.75), 9);
    expect(side.width).toBeCloseTo(inches(5.5), 9);
    expect(side.thickness).toBeCloseTo(12.7, 9);
    expect(side.jointAllowance).toBeCloseTo(6.35, 9);
    expect(bottom.grain).toBe('any');
    expect(bottom.length).toBeCloseTo(inches(13 + 7 / 16), 9);
    expect(stile.length).toBeCloseTo(inches(21), 9);
  });

  test('a metric XLSX reads the same way, numbers and text cells alike', async () => {
    const { report, guess } = await pipeline('vanity.xlsx', fixture('vanity-metric.xlsx'));
    expect(guess.unit).toBe('mm');
    expect(report.invalidCount).toBe(0);
    expect(report.valid.map((v) => [v.line, v.part.label, v.part.quantity, v.part.length, v.part.width, v.part.thickness, v.part.grain])).toEqual([
      [2, 'Side', 2, 720, 560, 18, 'along-length'],
      [3, 'Shelf', 1, 764, 540, 18, 'any'],
      [4, 'Top rail', 1, 764, 100, 18, 'along-length'],
    ]);
  });

  test('a semicolon-separated CSV with a byte-order mark and decimal commas, as European spreadsheets save it', async () => {
    const { report } = await pipeline('eu.csv', bytes('\uFEFFPart;Qty;Length;Width;Thickness;Material\nSide;2;"502,5 mm";300;18;MDF\n'));
    expect(report.valid[0].part).toMatchObject({ label: 'Side', length: 502.5, width: 300, thickness: 18, material: 'MDF' });
  });

  test('a unit written in a cell wins over the unit chosen for bare numbers', async () => {
    const { report } = await pipeline('mixed.csv', bytes('Part,Qty,Length,Width,Thickness,Material\nShelf,1,600 mm,12",18mm,MDF\n'), 'in');
    expect(report.valid[0].part).toMatchObject({ length: 600, width: 304.8, thickness: 18 });
  });

  test('blank rows are skipped and counted, and line numbers still point at the file', async () => {
    const { upload } = await pipeline(
      'gaps.csv',
      bytes('Part,Qty,Length,Width,Thickness,Material\n\nShelf,1,600,300,18,MDF\n,,,,,\nTop,1,600,300,18,MDF\n'),
    );
    expect(upload.blankRows).toBe(2);
    expect(upload.rows.map((r) => r.line)).toEqual([3, 5]);
  });
});

describe('every kind of bad row is listed with its reason, and good rows still read', () => {
  const header = 'Part,Qty,Length,Width,Thickness,Material,Grain,Joint allowance';
  test.each([
    ['a missing name', ',1,600,300,18,MDF,,', 'label', 'Part is empty.'],
    ['a quantity in words', 'Shelf,two,600,300,18,MDF,,', 'quantity', 'Quantity “two” is not a whole number.'],
    ['a fractional quantity', 'Shelf,1.5,600,300,18,MDF,,', 'quantity', 'Quantity “1.5” is not a whole number.'],
    ['a zero quantity', 'Shelf,0,600,300,18,MDF,,', 'quantity', 'Quantity must be at least 1.'],
    ['a length that is not a length', 'Shelf,1,six hundred,300,18,MDF,,', 'length', 'Length “six hundred”:'],
    ['an empty width', 'Shelf,1,600,,18,MDF,,', 'width', 'Width is empty.'],
    ['a zero thickness', 'Shelf,1,600,300,0,MDF,,', 'thickness', 'Thickness “0”:'],
    ['inches read as mm (0.75 under mm)', 'Shelf,1,600,300,0.75,MDF,,', 'thickness', 'thinner than any stock'],
    ['a fraction under mm', 'Shelf,1,600,300,3/4,MDF,,', 'thickness', 'A fraction means inches'],
    ['a missing material', 'Shelf,1,600,300,18,,,', 'material', 'Material is empty.'],
    ['an unknown grain word', 'Shelf,1,600,300,18,MDF,sideways,', 'grain', 'Grain “sideways” is not understood'],
    ['a joint allowance longer than the part', 'Shelf,1,600,300,18,MDF,,700', 'jointAllowance', 'must be shorter than the length'],
    [
      'a cell over the length limit',
      `${'x'.repeat(UPLOAD_LIMITS.maxCellLength + 1)},1,600,300,18,MDF,,`,
      'label',
      `the limit is ${UPLOAD_LIMITS.maxCellLength}`,
    ],
    ['a control character', 'Shel\u0007f,1,600,300,18,MDF,,', 'label', 'control characters'],
    ['a size slipped by a unit (600 m)', 'Shelf,1,600 m,300,18,MDF,,', 'length', 'Length “600 m”:'],
  ])('%s (common practice, no source)', async (_what, row, field, message) => {
    const { report } = await pipeline('bad.csv', bytes(`${header}\nGood,1,600,300,18,MDF,,\n${row}\n`), 'mm');
    expect(report.valid.map((v) => v.line)).toEqual([2]);
    expect(report.invalidCount).toBe(1);
    const bad = report.rows[1];
    if (bad.ok) throw new Error('row 3 should be refused');
    expect(bad.line).toBe(3);
    expect(bad.problems.find((p) => p.field === field)?.message).toContain(message);
  });

  test('a row with several problems lists each one', async () => {
    const { report } = await pipeline('bad.csv', bytes(`${header}\n,zero,abc,,18,,,\n`), 'mm');
    const row = report.rows[0];
    expect(row.ok).toBe(false);
    if (!row.ok) expect(row.problems.map((p) => p.field).sort()).toEqual(['label', 'length', 'material', 'quantity', 'width']);
  });

  test('an XLSX with a bad quantity and a missing name lists both rows', async () => {
    const { report } = await pipeline('bad.xlsx', fixture('bad-rows.xlsx'), 'mm');
    expect(report.valid.map((v) => v.line)).toEqual([2]);
    expect(report.rows.filter((r) => !r.ok).map((r) => r.line)).toEqual([3, 4]);
  });
});

describe('malicious cells', () => {
  test('formula-looking and markup cells are kept as plain text, never evaluated or dropped', async () => {
    const csv = Papa.unparse([
      ['Part', 'Qty', 'Length', 'Width', 'Thickness', 'Material', 'Notes'],
      ['=HYPERLINK("http://example.invalid","x")', '1', '600', '300', '18', '@SUM(A1)', '<script>alert(1)</script>'],
    ]);
    const { report } = await pipeline('evil.csv', bytes(csv), 'mm');
    expect(report.valid[0].part).toMatchObject({
      label: '=HYPERLINK("http://example.invalid","x")',
      material: '@SUM(A1)',
      notes: '<script>alert(1)</script>',
    });
  });
});

describe('refused files', () => {
  test('a file over the size limit is refused before it is read, saying the limit', async () => {
    const big = bytes('Part,Qty\n' + 'x,1\n'.repeat(UPLOAD_LIMITS.maxFileBytes / 4 + 10));
    const read = await readCutListFile({ name: 'huge.csv', bytes: big });
    expect(read).toEqual({ ok: false, error: expect.stringContaining(`the limit is ${UPLOAD_LIMITS.maxFileBytes / 1024} KB`) });
  });

  test('a file with more rows than the limit is refused, saying the limit', async () => {
    const many = bytes('Part,Qty,Length,Width,Thickness,Material\n' + 'a,1,1,1,1,b\n'.repeat(UPLOAD_LIMITS.maxRows + 1));
    const read = await readCutListFile({ name: 'many.csv', bytes: many });
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.error).toContain(`the limit is ${UPLOAD_LIMITS.maxRows.toLocaleString('en-US')} rows`);
  });

  test.each([
    ['a PDF', 'list.pdf', bytes('%PDF-1.7'), 'is not a CSV or Excel'],
    ['an empty file', 'empty.csv', new ArrayBuffer(0), 'is empty'],
    ['binary posing as CSV', 'sneaky.csv', new Uint8Array([80, 0, 1, 2]).buffer as ArrayBuffer, 'binary data'],
    ['invalid UTF-8', 'latin1.csv', new Uint8Array([0x50, 0xe9, 0x0a]).buffer as ArrayBuffer, 'not UTF-8'],
    ['a CSV named .xlsx', 'fake.xlsx', bytes('Part,Qty\n'), 'could not be read as an Excel workbook'],
    [
      'too many columns',
      'wide.csv',
      bytes(Array.from({ length: UPLOAD_LIMITS.maxColumns + 1 }, (_, i) => `c${i}`).join(',')),
      'columns; the limit is',
    ],
  ])('%s is refused with a clear reason', async (_what, name, data, message) => {
    const read = await readCutListFile({ name, bytes: data });
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.error).toContain(message);
  });
});

describe('column mapping and unit detection', () => {
  test.each([
    [
      ['Part name', 'QTY', 'Length (in)', 'Width (in)', 'Thk', 'Species', 'Grain direction', 'Comments'],
      ['label', 'quantity', 'length', 'width', 'thickness', 'material', 'grain', 'notes'],
    ],
    [
      ['Description', 'Pcs', 'L', 'W', 'T', 'Stock', 'Colour'],
      ['label', 'quantity', 'length', 'width', 'thickness', 'material', null],
    ],
    [
      ['Name', 'Name', 'Qty'],
      ['label', null, 'quantity'],
    ],
  ])('headers %j map to %j (common practice, no source)', (header, expected) => {
    expect(guessMapping(header)).toEqual(expected);
  });

  test('a first row of numbers is data, not a header', () => {
    expect(looksLikeHeader(['Side', '2', '720', '560', '18', 'Baltic birch'])).toBe(false);
    expect(looksLikeHeader(['Part', 'Qty', 'Length'])).toBe(true);
  });

  test.each([
    [{ lengths: ['19-3/4', '5 1/2'], thicknesses: ['1/2'] }, 'in'],
    [{ lengths: ['600', '300'], thicknesses: ['18'] }, 'mm'],
    [{ lengths: ['24', '12'], thicknesses: ['0.75'] }, 'in'],
    [{ lengths: ['600 mm'], thicknesses: [] }, 'mm'],
    [{ lengths: ['24', '12'], thicknesses: [] }, null],
  ] as const)('sizes %j read as %s (no part is under 3 mm or over 3″ thick: common practice, no source)', (cells, unit) => {
    expect(detectUnit(cells).unit).toBe(unit);
  });
});

describe('properties', () => {
  test('no row is ever lost: every uploaded row comes back either as a part or with at least one problem', () => {
    const cellArb = fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom('600', '3/4', '18', 'MDF', '1', '', '=1+1', '19-3/4"'));
    fc.assert(
      fc.property(
        fc.array(fc.array(cellArb, { minLength: 6, maxLength: 6 }), { minLength: 1, maxLength: 30 }),
        fc.constantFrom('in', 'mm'),
        (cells, unit) => {
          const rows = cells.map((c, i) => ({ line: i + 2, cells: c }));
          const report = validateUploadRows({ columns: ['label', 'quantity', 'length', 'width', 'thickness', 'material'], rows, unit });
          expect(report.rows.map((r) => r.line)).toEqual(rows.map((r) => r.line));
          for (const r of report.rows) if (!r.ok) expect(r.problems.length).toBeGreaterThan(0);
          expect(report.valid.length + report.invalidCount).toBe(rows.length);
        },
      ),
    );
  });
});

describe('the downloadable templates', () => {
  test.each([
    ['cut-list-imperial.csv', 'in'],
    ['cut-list-metric.csv', 'mm'],
  ] as const)('%s reads back with every row valid and its unit detected as %s', async (name, unit) => {
    const text = fs.readFileSync(path.resolve('public/templates', name));
    const { report, guess } = await pipeline(name, text.buffer.slice(text.byteOffset, text.byteOffset + text.byteLength) as ArrayBuffer);
    expect(guess.unit).toBe(unit);
    expect(report.invalidCount).toBe(0);
    expect(report.valid.length).toBe(3);
  });
});

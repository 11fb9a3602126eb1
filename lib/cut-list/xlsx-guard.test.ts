import fs from 'node:fs';
import path from 'node:path';
import { zipSync } from 'fflate';
import { describe, expect, test } from 'vitest';
import { checkXlsxSize, XLSX_LIMITS } from './xlsx-guard';
import { readXlsx } from './read-xlsx';

// Archives built with fflate's own zip writer (a general-purpose library, the reference here); the first is a
// real workbook saved by a spreadsheet program.
const real = new Uint8Array(fs.readFileSync(path.join(import.meta.dirname, 'fixtures', 'vanity-metric.xlsx')));
const ab = (u: Uint8Array) => u.buffer.slice(u.byteOffset, u.byteOffset + u.byteLength) as ArrayBuffer;

describe('what an XLSX may unpack to', () => {
  test('a real cut-list workbook passes, its size and cells counted', () => {
    const r = checkXlsxSize(real);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.inflatedBytes).toBeGreaterThan(real.length);
      expect(r.cells).toBeGreaterThan(10);
    }
  });

  test('a bomb (a few hundred kB that inflates to 100 MB) is stopped at the limit, not inflated whole, with a message', () => {
    // 100 MB of one byte deflates about 1000:1; built in 4 MB pieces so the test itself stays small.
    const piece = new Uint8Array(4 * 1024 * 1024).fill(0x20);
    const entries: Record<string, Uint8Array> = {};
    for (let i = 0; i < 25; i++) entries[`xl/media/filler${i}.bin`] = piece;
    const bomb = zipSync(entries, { level: 9 });
    expect(bomb.length).toBeLessThan(1024 * 1024);

    const r = checkXlsxSize(bomb);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error).toMatch(/unpacks to more than 40 MB/);
      // Counting stopped within one step's output of the limit, far from 100 MB.
      expect(r.inflatedBytes).toBeLessThan(XLSX_LIMITS.maxInflatedBytes + 8 * 1024 * 1024);
    }
  });

  test('a sheet with more cells than a cut list can have is refused before the reader sees it', async () => {
    const cell = '<c r="A1" t="inlineStr"><is><t>x</t></is></c>';
    const sheet = `<?xml version="1.0"?><worksheet><sheetData><row r="1">${cell.repeat(XLSX_LIMITS.maxCells + 10)}</row></sheetData></worksheet>`;
    const zip = zipSync({ 'xl/worksheets/sheet1.xml': new TextEncoder().encode(sheet) }, { level: 6 });
    const r = checkXlsxSize(zip);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toMatch(/more than 300,300 cells/);
    const read = await readXlsx(ab(zip));
    expect(read).toEqual({ ok: false, error: expect.stringMatching(/cells/) });
  });

  test('a cell tag split across two inflated chunks is counted once', () => {
    const cell = '<c r="B2"/>';
    const sheet = new TextEncoder().encode(`<sheetData>${cell.repeat(50_000)}</sheetData>`);
    const r = checkXlsxSize(zipSync({ 'xl/worksheets/sheet1.xml': sheet }));
    expect(r).toMatchObject({ ok: true, cells: 50_000 });
  });
});

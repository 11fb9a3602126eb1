import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { checkStockCsv, parseMoneyCents, parseStockCsv } from './stock-csv';

const HEADER = 'Kind,Material,Thickness,Length,Width,Quantity,Cost,Actual thickness,Supplier,Location,Surfacing\n';

describe('reading a stock file', () => {
  test('reads sheets and boards with lengths in any form the shop writes them', () => {
    const csv =
      HEADER + 'sheet,Maple ply,3/4",96,48,10,$94.00,23/32,Cedar Run,Rack B1,\n' + "board,White oak,4/4,8',6 1/2,30,9.25,,Millbrook,Lumber 1,S2S\n";
    const { rows, errors, fileErrors } = parseStockCsv(csv, 'in');
    expect(fileErrors).toEqual([]);
    expect(errors).toEqual([]);
    expect(rows[0]).toMatchObject({
      line: 2,
      item: {
        kind: 'sheet',
        length: expect.closeTo(inches(96), 9),
        thickness: expect.closeTo(inches(23 / 32), 9),
        onHand: 10,
        costCents: 9400,
        location: 'Rack B1',
      },
    });
    // 4/4 with no actual thickness is taken at its nominal inch (AHEC: 4/4 = 1″).
    expect(rows[1]).toMatchObject({
      line: 3,
      item: {
        kind: 'board',
        length: expect.closeTo(inches(96), 9),
        width: expect.closeTo(inches(6.5), 9),
        thickness: expect.closeTo(25.4, 9),
        costCents: 925,
        surfacing: 'S2S',
      },
    });
  });

  test('names every bad row with its line and every reason, and keeps the good rows apart', () => {
    const csv =
      HEADER + 'sheet,MDF,18 mm,2440 mm,1220 mm,5,46,,,,\n' + 'plank,,3/4,abc,48,-2,free,,,,\n' + 'sheet,MDF,18 mm,2440 mm,1220 mm,2.5,46,,,,\n';
    const { rows, errors } = parseStockCsv(csv, 'mm');
    expect(rows.map((r) => r.line)).toEqual([2]);
    expect(errors.map((e) => e.line)).toEqual([3, 4]);
    const reasons = errors[0].messages.join(' | ');
    expect(reasons).toMatch(/kind/);
    expect(reasons).toMatch(/length/);
    expect(reasons).toMatch(/quantity/);
    expect(reasons).toMatch(/cost/);
    expect(errors[1].messages.join()).toMatch(/quantity: "2.5" is not a whole number/);
  });

  test('a file without the needed columns is refused as a whole', () => {
    expect(parseStockCsv('material,qty\nMDF,3\n', 'mm').fileErrors[0]).toMatch(/Missing columns: kind, thickness, length, width/);
  });

  test.each([
    ['94', 9400],
    ['$94.5', 9450],
    ['9.25', 925],
    ['1,50', 150],
    ['ten', null],
    ['-3', null],
  ])('money "%s" reads as %s cents', (text, cents) => {
    expect(parseMoneyCents(text)).toBe(cents);
  });
});

describe('checking a big stock file for a request', () => {
  test('gives the same rows and errors as the all-at-once check, and hands the event loop back as it goes', async () => {
    const good = 'sheet,MDF,18 mm,2440 mm,1220 mm,5,46,,,,\n';
    const bad = 'plank,,3/4,abc,48,-2,free,,,,\n';
    const csv = HEADER + Array.from({ length: 3000 }, (_, i) => (i % 7 === 0 ? bad : good)).join('');
    let ticks = 0;
    let running = true;
    const tick = () => {
      ticks++;
      if (running) setImmediate(tick);
    };
    setImmediate(tick);
    const slow = await checkStockCsv(csv, 'mm');
    running = false;
    expect(slow).toEqual(parseStockCsv(csv, 'mm'));
    expect(slow.rows).toHaveLength(3000 - Math.ceil(3000 / 7));
    // Another task ran between slices: at least once per 25 rows.
    expect(ticks).toBeGreaterThanOrEqual(3000 / 25);
  });
});

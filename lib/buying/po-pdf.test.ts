import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { pieceBoardFeet } from '@/lib/stock/pricing';
import { describeSize } from './describe';
import { purchaseOrderPdf } from './po-pdf';

/** The PDF's text as poppler's pdftotext reads it (a general-purpose reference reader, Debian's poppler-utils). */
function pdfText(bytes: Buffer): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'kw-po-pdf-'));
  const file = path.join(dir, 'po.pdf');
  fs.writeFileSync(file, bytes);
  try {
    return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

const imperial = { system: 'imperial', precision: 16, feet: false } as const;
const metric = { system: 'metric', precision: 1, feet: false } as const;

// Needs Debian's poppler-utils (`npm test` installs it).
describe('the purchase order PDF (read back with pdftotext)', () => {
  test('shop and its details, supplier, sizes as on screen (¾″, 6½″), unit costs, board feet and the total', async () => {
    const birch = {
      kind: 'sheet' as const,
      material: 'Baltic birch',
      nominalThickness: '3/4"',
      thickness: 18,
      length: inches(60),
      width: inches(60),
      surfacing: '',
      grade: '',
    };
    const oak = {
      kind: 'board' as const,
      material: 'White oak',
      nominalThickness: '4/4',
      thickness: inches(13 / 16),
      length: inches(96),
      width: inches(6.5),
      surfacing: 'S2S',
      grade: 'FAS',
    };
    // By hand: a 4/4 board 96″ × 6½″ is 1 × 6.5 × 8 / 12 = 4.33 bd ft (AHEC, "Measurement"); at $9.25 a board foot
    // one board is $40.08, and 10 boards $400.80. Three sheets at $89.00 are $267.00. Total $667.80.
    expect(pieceBoardFeet(oak)).toBeCloseTo(4.3333, 4);
    const bytes = await purchaseOrderPdf({
      shop: { name: 'Alder & Finch Joinery', details: '18 Larch Row, Pinecrest\n(555) 010-4477' },
      title: 'PO-0012',
      issued: '2026-12-03',
      supplier: { name: 'Cedar Run Plywood', email: 'orders@cedarrun.example' },
      currency: 'USD',
      lines: [
        { description: describeSize(birch, imperial), quantity: 3, costUnit: 'sheet', unitCostCents: 8900, boardFeetEach: null, totalCents: 26700 },
        {
          description: describeSize(oak, imperial),
          quantity: 10,
          costUnit: 'bd ft',
          unitCostCents: 925,
          boardFeetEach: pieceBoardFeet(oak),
          totalCents: 40080,
        },
      ],
      totalCents: 66780,
      note: 'Deliver to the back door, please.',
      pageSize: 'LETTER',
    });
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    if (process.env.KW_PDF_OUT) fs.writeFileSync(process.env.KW_PDF_OUT, bytes);
    const text = pdfText(bytes);
    for (const s of [
      'Alder & Finch Joinery',
      '18 Larch Row, Pinecrest',
      '(555) 010-4477',
      'Purchase order PO-0012',
      'Issued 2026-12-03',
      'Cedar Run Plywood',
      'orders@cedarrun.example',
      'Baltic birch ¾″, 60″ × 60″',
      'White oak 4/4 S2S FAS, 96″ × 6½″',
      '4.33 bd ft each, 43.33 bd ft in all',
      'Deliver to the back door, please.',
    ]) {
      expect(text).toContain(s);
    }
    for (const s of ['$89.00 / sheet', '$9.25 / bd ft', '$267.00', '$400.80', '$667.80']) expect(text).toContain(s);
  }, 30_000);

  test('a metric shop’s sizes print in millimetres, on A4', async () => {
    const mdf = {
      kind: 'sheet' as const,
      material: 'MDF',
      nominalThickness: '18 mm',
      thickness: 18,
      length: 2440,
      width: 1220,
      surfacing: '',
      grade: '',
    };
    const bytes = await purchaseOrderPdf({
      shop: { name: 'Tischlerei Amsel', details: '' },
      title: 'PO-0001',
      issued: '2026-12-03',
      supplier: { name: 'Holzhandel Nord', email: '' },
      currency: 'EUR',
      lines: [{ description: describeSize(mdf, metric), quantity: 2, costUnit: 'sheet', unitCostCents: 3450, boardFeetEach: null, totalCents: 6900 }],
      totalCents: 6900,
      note: '',
      pageSize: 'A4',
    });
    const text = pdfText(bytes);
    expect(text).toContain('MDF 18 mm, 2440 mm × 1220 mm');
    expect(text).toContain('€69.00');
  }, 30_000);
});

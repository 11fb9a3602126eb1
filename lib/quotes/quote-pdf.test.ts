import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { quoteTotals } from '@/lib/costing/quote-totals';
import type { QuoteLine } from '@/shared/schemas/quote';
import { quotePdf } from './quote-pdf';

const LINES: QuoteLine[] = [
  {
    id: 'm-1',
    kind: 'material',
    description: 'Maple ply ¾″, 96″ × 48″ (from stock)',
    quantity: 3,
    unit: 'sheet',
    unitCostMinor: 6840,
    taxable: true,
    note: 'estimator note: check the rack',
  },
  {
    id: 'h-1',
    kind: 'hardware',
    description: 'Side-mount slides, 19¾″, full extension',
    quantity: 4,
    unit: 'pair',
    unitCostMinor: 1495,
    taxable: true,
    note: '',
  },
  {
    id: 'l-1',
    kind: 'labour',
    description: 'Saw time: 46 cuts, 9 stock pieces handled',
    quantity: 0.95,
    unit: 'h',
    unitCostMinor: 6500,
    taxable: false,
    note: '',
  },
];
const totals = quoteTotals({
  currency: 'USD',
  lines: LINES,
  markupPercent: { material: 30, hardware: 20 },
  discount: { kind: 'percent', percent: 0 },
  taxPercent: 8.25,
  depositPercent: 50,
});

/** The PDF's text as poppler's pdftotext reads it (a general-purpose reference reader, Debian's poppler-utils). */
function pdfText(bytes: Buffer): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'kw-quote-pdf-'));
  const file = path.join(dir, 'q.pdf');
  fs.writeFileSync(file, bytes);
  try {
    return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

// Needs Debian's poppler-utils (`npm test` installs it, as it does chromium and postgresql).
describe('the quote PDF (read back with pdftotext)', () => {
  test('shop, customer, lines with fractions as on screen, totals, deposit, validity, terms and the link; never cost, notes or hours', async () => {
    const bytes = await quotePdf({
      shop: { name: 'Alder & Finch Joinery' },
      title: 'Q-0007 rev B',
      issued: '2026-12-03',
      validUntil: '2027-01-02',
      validityDays: 30,
      customer: {
        name: 'Priya & Sam Hollis',
        company: '',
        email: 'hollis@example.com',
        phone: '',
        billingAddress: '18 Larch Row',
        siteAddress: '18 Larch Row',
      },
      jobName: 'Hollis kitchen',
      currency: 'USD',
      lines: LINES,
      totals,
      taxPercent: 8.25,
      depositPercent: 50,
      terms: 'A deposit is due on acceptance.',
      customerLink: 'https://shop.example.com/q/abc',
      pageSize: 'LETTER',
    });
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    if (process.env.KW_PDF_OUT) fs.writeFileSync(process.env.KW_PDF_OUT, bytes);
    const text = pdfText(bytes);
    for (const s of [
      'Alder & Finch Joinery',
      'Q-0007 rev B',
      'Priya & Sam Hollis',
      'Maple ply ¾″',
      '19¾″',
      'Valid until 2027-01-02',
      'A deposit is due on acceptance.',
      'https://shop.example.com/q/abc',
      'Deposit on acceptance (50 %)',
    ])
      expect(text).toContain(s);
    // By hand: 3 × 68.40 × 1.3 = 266.76; 4 × 14.95 × 1.2 = 71.76; 0.95 h × 65.00 = 61.75; subtotal 400.27;
    // tax 8.25 % of 338.52 = 27.93; total 428.20; deposit 214.10.
    for (const s of ['$266.76', '$71.76', '$61.75', '$400.27', '$27.93', '$428.20', '$214.10']) expect(text).toContain(s);
    expect(text).not.toContain('estimator note');
    expect(text).not.toContain('0.95 h');
    expect(text).not.toContain('$65.00');
  }, 30_000);
});

import { PDFDocument } from 'pdf-lib';
import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { part, request, sheet } from '@/lib/nesting/test-support';
import type { ShopUnits } from '@/shared/schemas/units';
import { PAGE_SIZES, sawOrderPdf } from './saw-order-pdf';
import { carcassRequest, nest } from './test-plans';

const units: ShopUnits = { system: 'imperial', precision: 16, feet: false };

describe('the saw-order PDF', () => {
  test('is a PDF that pdf-lib reads back, with one Letter page per stock piece', async () => {
    const { plan } = await nest(carcassRequest());
    expect(plan.pieces.length).toBeGreaterThan(1);
    const bytes = await sawOrderPdf({ title: 'Test kitchen', subtitle: 'Carcasses', units, kerf: inches(1 / 8), pieces: plan.pieces });
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe('%PDF-');
    const doc = await PDFDocument.load(bytes);
    expect(doc.getPageCount()).toBe(plan.pieces.length);
    // US Letter is 8½ × 11 in = 612 × 792 pt (72 pt to the inch, PDF 1.7 / ISO 32000-1 user space).
    expect(doc.getPage(0).getSize()).toEqual({ width: 612, height: 792 });
    expect(doc.getTitle()).toBe('Saw order - Test kitchen');
  });

  test('prints on A4 when asked (210 × 297 mm = 595.28 × 841.89 pt, ISO 216)', async () => {
    const { plan } = await nest(carcassRequest());
    const doc = await PDFDocument.load(await sawOrderPdf({ title: 'A4', subtitle: '', units, kerf: inches(1 / 8), pieces: plan.pieces, pageSize: 'a4' }));
    const { width, height } = doc.getPage(0).getSize();
    expect(width).toBeCloseTo((210 / 25.4) * 72, 1);
    expect(height).toBeCloseTo((297 / 25.4) * 72, 1);
    expect(PAGE_SIZES.a4[0]).toBeCloseTo(595.28, 2);
  });

  test('a piece with more steps than fit one page goes on to a continuation page, never dropping a step', async () => {
    // Forty small blocks on one sheet need far more cuts than one page holds.
    const { plan } = await nest(request([part('block', 100, 60, { quantity: 40, label: 'Block' })], [sheet('s', 1220, 610, { count: 1 })], { kerf: 3 }));
    expect(plan.pieces).toHaveLength(1);
    const steps = plan.pieces[0].sawOrder!.length;
    expect(steps).toBeGreaterThan(26);
    const doc = await PDFDocument.load(await sawOrderPdf({ title: 'Blocks', subtitle: '', units, kerf: 3, pieces: plan.pieces }));
    expect(doc.getPageCount()).toBeGreaterThan(1);
  });

  test('labels the standard fonts cannot encode are written with a stand-in, not a failed download', async () => {
    const { plan } = await nest(request([part('p', 500, 300, { label: 'Tür ☃ 抽屉 — left’s' })], [sheet('s', 1220, 610)], { kerf: 3 }));
    const doc = await PDFDocument.load(await sawOrderPdf({ title: 'Überschrank ☃', subtitle: '', units, kerf: 3, pieces: plan.pieces }));
    expect(doc.getPageCount()).toBe(1);
  });
});

import { PDFDocument } from 'pdf-lib';
import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { part, request, sheet } from '@/lib/nesting/test-support';
import type { ShopUnits } from '@/shared/schemas/units';
import { SAW_CAUTIONS } from '@/lib/safety';
import { describeSawOrder } from './describe-step';
import { pdfText } from './pdf-text';
import { PAGE_SIZES, sawOrderPdf } from './saw-order-pdf';
import { helveticaPair, pdfTextRuns } from './test-pdf-runs';
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
    const doc = await PDFDocument.load(
      await sawOrderPdf({ title: 'A4', subtitle: '', units, kerf: inches(1 / 8), pieces: plan.pieces, pageSize: 'a4' }),
    );
    const { width, height } = doc.getPage(0).getSize();
    expect(width).toBeCloseTo((210 / 25.4) * 72, 1);
    expect(height).toBeCloseTo((297 / 25.4) * 72, 1);
    expect(PAGE_SIZES.a4[0]).toBeCloseTo(595.28, 2);
  });

  test('a piece with more steps than fit one page goes on to a continuation page, never dropping a step', async () => {
    // Forty small blocks on one sheet need far more cuts than one page holds.
    const { plan } = await nest(
      request([part('block', 100, 60, { quantity: 40, label: 'Block' })], [sheet('s', 1220, 610, { count: 1 })], { kerf: 3 }),
    );
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

describe('the saw-order PDF’s text', () => {
  const plain = (s: string) => s.replace(/\u00a0/g, ' ');

  test('every fence setting, every size, every part’s #n and every caution is drawn whole, and every line stays inside the margins', async () => {
    const { plan } = await nest(carcassRequest());
    // One rip marked too narrow for the fence, as the saw order marks it: its heading is the longest a step has.
    const rip = plan.pieces[0].sawOrder!.find((s) => s.kind === 'rip')!;
    rip.narrow = true;
    const bytes = await sawOrderPdf({
      title: 'Hollis kitchen',
      subtitle: 'Carcasses and backs · 2 stock pieces',
      units,
      kerf: inches(1 / 8),
      pieces: plan.pieces,
    });
    const runs = await pdfTextRuns(bytes);
    const fonts = await helveticaPair();
    const [pw] = PAGE_SIZES.letter;
    // Runs are drawn in reading order and wrap only at spaces, so joined with spaces they give back each text.
    const drawn = plain(runs.map((r) => r.text).join(' '));
    expect(drawn).not.toMatch(/\.\.\./);
    for (const piece of plan.pieces) {
      for (const step of describeSawOrder(piece, units, 'ascii')) {
        expect(drawn).toContain(`Fence ${step.fence}`);
        for (const p of step.produced) {
          if (p.role === 'offcut') expect(drawn).toMatch(new RegExp(`[Kk]eep offcut ${escape(p.size)}`));
          if (p.role === 'waste' && step.frees.length === 0) expect(drawn).toContain('waste falls off');
          if (p.role === 'part') expect(drawn).toContain(p.part);
        }
      }
    }
    expect(drawn.replace(/ +/g, ' ')).toContain(`RIP ${rip.piece}${rip.trim ? ' - TRIM' : ''} - SLED / TRACK / BAND SAW`);
    for (const caution of SAW_CAUTIONS) expect(drawn).toContain(pdfText(caution));
    for (const r of runs) {
      const w = (r.bold ? fonts.bold : fonts.regular).widthOfTextAtSize(r.text, r.size);
      expect(r.x, r.text).toBeGreaterThanOrEqual(36 - 0.01);
      expect(r.x + w, r.text).toBeLessThanOrEqual(pw - 36 + 0.01);
    }
  });

  test('a long name and a crowded step wrap instead of being cut: "…; waste falls off" stays', async () => {
    const { plan } = await nest(
      request([part('p', 400, 250, { label: 'Upper cabinet left-hand side panel with shelf-pin holes', quantity: 3 })], [sheet('s', 1220, 610)], {
        kerf: 3,
        trim: 6,
      }),
    );
    const runs = await pdfTextRuns(
      await sawOrderPdf({
        title: 'A very long job name for a customer with a long name indeed',
        subtitle: 'Plan 1',
        units,
        kerf: 3,
        pieces: plan.pieces,
      }),
    );
    const drawn = plain(runs.map((r) => r.text).join(' '));
    expect(drawn).not.toMatch(/\.\.\./);
    for (const n of [1, 2, 3]) expect(drawn).toContain(`Upper cabinet left-hand side panel with shelf-pin holes #${n}`);
    const steps = plan.pieces.flatMap((p) => describeSawOrder(p, units, 'ascii'));
    expect(steps.some((s) => s.produced.some((p) => p.role === 'waste'))).toBe(true);
    expect(drawn).toContain('waste falls off');
  });
});

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

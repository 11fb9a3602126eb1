import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { part, request, sheet } from '@/lib/nesting/test-support';
import type { ShopUnits } from '@/shared/schemas/units';
import { SAW_CAUTIONS } from '@/lib/safety';
import { pdfInfo, pdfLines, type PdfLine } from '@/tests/support/pdf-read';
import { describeSawOrder } from './describe-step';
import { MARGIN, PAGE_SIZES, sawOrderPdf, stepTextWidth } from './saw-order-pdf';
import { carcassRequest, nest } from './test-plans';

// Read back with Debian's poppler-utils (pdfinfo, pdftotext), which `npm test` installs.
const units: ShopUnits = { system: 'imperial', precision: 16, feet: false };
/** poppler may keep a no-break space inside a word or turn it into a space: compare with plain spaces. */
const plain = (s: string) => s.replace(/\u00a0/g, ' ').replace(/ +/g, ' ');
/** As printed: the shipped font has no ≈, so a rounded length is marked with ~ (formatLength's ascii mark). */
const printed = (s: string) => plain(s.replace(/≈/g, '~'));
/** Lines in poppler's reading order, joined with spaces: texts that wrap at spaces read back whole. */
const joined = (lines: PdfLine[]) => plain(lines.map((l) => l.text).join(' '));

describe('the saw-order PDF', () => {
  test('is a PDF poppler reads back, with one Letter page per stock piece', async () => {
    const { plan } = await nest(carcassRequest());
    expect(plan.pieces.length).toBeGreaterThan(1);
    const bytes = await sawOrderPdf({ title: 'Test kitchen', subtitle: 'Carcasses', units, kerf: inches(1 / 8), pieces: plan.pieces });
    expect(new TextDecoder().decode(bytes.subarray(0, 5))).toBe('%PDF-');
    const info = pdfInfo(bytes);
    expect(info.pages).toHaveLength(plan.pieces.length);
    // US Letter is 8½ × 11 in = 612 × 792 pt (72 pt to the inch, PDF 1.7 / ISO 32000-1 user space).
    expect(info.pages[0]).toEqual({ width: 612, height: 792 });
    expect(info.title).toBe('Saw order · Test kitchen');
    // A heading per stock piece, each on its own page.
    const lines = pdfLines(bytes);
    plan.pieces.forEach((_, i) => expect(lines.filter((l) => l.page === i).map((l) => l.text)).toContain(`Sheet ${String.fromCharCode(65 + i)}`));
  });

  test('prints on A4 when asked (210 × 297 mm = 595.28 × 841.89 pt, ISO 216)', async () => {
    const { plan } = await nest(carcassRequest());
    const info = pdfInfo(await sawOrderPdf({ title: 'A4', subtitle: '', units, kerf: inches(1 / 8), pieces: plan.pieces, pageSize: 'a4' }));
    const { width, height } = info.pages[0];
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
    const bytes = await sawOrderPdf({ title: 'Blocks', subtitle: '', units, kerf: 3, pieces: plan.pieces });
    const pages = pdfInfo(bytes).pages.length;
    expect(pages).toBeGreaterThan(1);
    const lines = pdfLines(bytes);
    // Every step's number is printed once, and every page after the first says it carries on the piece.
    const numbers = lines
      .map((l) => l.text)
      .filter((t) => /^\d+$/.test(t))
      .map(Number);
    expect(numbers.sort((a, b) => a - b)).toEqual(Array.from({ length: steps }, (_, i) => i + 1));
    for (let p = 1; p < pages; p++) expect(lines.filter((l) => l.page === p).map((l) => l.text)).toContain('Sheet A (continued)');
    for (let p = 0; p < pages; p++) expect(joined(lines.filter((l) => l.page === p))).toContain('licensed practice');
  });

  test('characters the shipped font cannot draw are written with a stand-in, not a failed download; the rest prints as typed', async () => {
    const { plan } = await nest(request([part('p', 500, 300, { label: 'Tür ☃ 抽屉 — left’s' })], [sheet('s', 1220, 610)], { kerf: 3 }));
    const bytes = await sawOrderPdf({ title: 'Überschrank ☃', subtitle: '', units, kerf: 3, pieces: plan.pieces });
    expect(pdfInfo(bytes).pages).toHaveLength(1);
    const text = joined(pdfLines(bytes));
    expect(text).toContain('Überschrank ?');
    expect(text).toContain('Tür ? ?? — left’s #1');
  });
});

describe('the saw-order PDF’s text', () => {
  test('every fence setting, every size, every part’s #n and every caution is printed whole as on screen, every line stays inside its column, and nothing runs into the cautions', async () => {
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
    const lines = pdfLines(bytes);
    const [pw] = PAGE_SIZES.letter;
    const drawn = joined(lines);
    expect(drawn).not.toContain('…');
    // Lengths as the screen shows them (formatLength's default style): 34-1/2″, with × between the sides.
    expect(drawn).toContain('34-1/2″');
    const lineTexts = lines.map((l) => plain(l.text));
    for (const piece of plan.pieces) {
      for (const step of describeSawOrder(piece, units)) {
        // The fence setting on a line of its own, whole (it shrinks rather than wrap).
        expect(lineTexts).toContain(printed(`Fence ${step.fence}`));
        for (const p of step.produced) {
          if (p.role === 'offcut') expect(drawn).toMatch(new RegExp(`[Kk]eep offcut ${escape(printed(p.size))}`));
          if (p.role === 'waste' && step.frees.length === 0) expect(drawn).toContain('waste falls off');
          if (p.role === 'part') expect(drawn).toContain(p.part);
        }
      }
    }
    expect(drawn).toContain(`RIP ${rip.piece}${rip.trim ? ' · TRIM' : ''} · SLED / TRACK / BAND SAW`);
    for (const caution of SAW_CAUTIONS) expect(drawn).toContain(plain(caution));

    const cellRight = (col: number) => MARGIN + (col + 1) * ((pw - 2 * MARGIN) / 2) - 8;
    expect(stepTextWidth(pw)).toBeGreaterThan(100);
    plan.pieces.forEach((_, page) => {
      const mine = lines.filter((l) => l.page === page);
      for (const l of mine) {
        expect(l.xMin, l.text).toBeGreaterThanOrEqual(MARGIN - 0.5);
        expect(l.xMax, l.text).toBeLessThanOrEqual(pw - MARGIN + 0.5);
      }
      const safety = mine.find((l) => l.text.startsWith('Safety:'))!;
      const firstFence = Math.min(...mine.filter((l) => l.text.startsWith('Fence ')).map((l) => l.yMin));
      // Step text (below the header, above the cautions) stays in its own column.
      for (const l of mine.filter((l) => l.yMin > firstFence - 14 && l.yMax < safety.yMin)) {
        expect(l.xMax, l.text).toBeLessThanOrEqual(cellRight(l.xMin < pw / 2 ? 0 : 1) + 0.5);
      }
      // The cautions stand clear below every step.
      const cautionTop = Math.min(...mine.filter((l) => l.yMin >= safety.yMin - 0.5).map((l) => l.yMin));
      for (const l of mine.filter((l) => l.yMin < safety.yMin - 0.5)) expect(l.yMax, l.text).toBeLessThanOrEqual(cautionTop);
    });
  });

  test('a long name and a crowded step wrap instead of being cut: "…; waste falls off" stays', async () => {
    const { plan } = await nest(
      request([part('p', 400, 250, { label: 'Upper cabinet left-hand side panel with shelf-pin holes', quantity: 3 })], [sheet('s', 1220, 610)], {
        kerf: 3,
        trim: 6,
      }),
    );
    const bytes = await sawOrderPdf({
      title: 'A very long job name for a customer with a long name indeed',
      subtitle: 'Plan 1',
      units,
      kerf: 3,
      pieces: plan.pieces,
    });
    const drawn = joined(pdfLines(bytes));
    expect(drawn).not.toContain('…');
    expect(drawn).toContain('A very long job name for a customer with a long name indeed');
    for (const n of [1, 2, 3]) expect(drawn).toContain(`Upper cabinet left-hand side panel with shelf-pin holes #${n}`);
    const steps = plan.pieces.flatMap((p) => describeSawOrder(p, units));
    expect(steps.some((s) => s.produced.some((p) => p.role === 'waste'))).toBe(true);
    expect(drawn).toContain('waste falls off');
  });
});

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

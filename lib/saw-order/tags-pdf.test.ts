import { PDFDocument } from 'pdf-lib';
import { describe, expect, test } from 'vitest';
import { part, request, sheet } from '@/lib/nesting/test-support';
import { formatLength } from '@/lib/units/format-length';
import { inches } from '@/lib/units/length';
import { LABEL_SHEETS, labelOrigin, labelSheet } from './label-sheets';
import { partTags } from './part-tags';
import { tagsPdf } from './tags-pdf';
import { helveticaPair, pdfTextRuns } from './test-pdf-runs';
import { carcassRequest, nest } from './test-plans';

const units = { system: 'imperial', precision: 16, feet: false } as const;

describe('the part-tags PDF', () => {
  test.each([
    // Letter 8½ × 11 in = 612 × 792 pt; A4 210 × 297 mm = 595.28 × 841.89 pt (72 pt to the inch, ISO 32000-1).
    ['letter-30', 612, 792],
    ['a4-24', 595.28, 841.89],
  ])('on %s: a page per sheet of labels, at the sheet’s exact size', async (id, w, h) => {
    const { request, plan } = await nest(carcassRequest());
    const tags = partTags(plan, request.parts);
    const sheet = labelSheet(id);
    const doc = await PDFDocument.load(await tagsPdf({ jobName: 'Test kitchen', tags, url: (t) => `http://x/parts/${t.partId}`, units, sheet }));
    expect(doc.getPageCount()).toBe(Math.ceil(tags.length / (sheet.columns * sheet.rows)));
    const size = doc.getPage(0).getSize();
    expect(size.width).toBeCloseTo(w, 1);
    expect(size.height).toBeCloseTo(h, 1);
  });

  test('more tags than one sheet holds go on to more pages; none is dropped', async () => {
    const { request, plan } = await nest(carcassRequest());
    const tags = partTags(plan, request.parts);
    const many = Array.from({ length: 3 }, () => tags).flat();
    const doc = await PDFDocument.load(
      await tagsPdf({ jobName: 'Ünïcode ☃', tags: many, url: () => 'http://x', units, sheet: labelSheet('a4-24') }),
    );
    expect(doc.getPageCount()).toBe(Math.ceil(many.length / 24));
  });
});

describe('what each tag says (the text drawn into the PDF)', () => {
  const frontsRequest = () =>
    request(
      [
        part('front', inches(23 + 15 / 16), inches(6 + 1 / 2), {
          label: 'Drawer front, upper left bank of the vanity',
          quantity: 4,
          material: 'Maple ply',
          thickness: inches(23 / 32),
        }),
        part('side', inches(34.5), inches(23), { label: 'Side', quantity: 2, material: 'Maple ply', thickness: inches(23 / 32) }),
      ],
      [sheet('ply', inches(96), inches(48), { material: 'Maple ply', thickness: inches(23 / 32) })],
      { kerf: inches(1 / 8) },
    );

  test.each(LABEL_SHEETS.map((s) => [s.id] as const))(
    'on %s every tag carries its whole size, its #n, material and thickness, and every line fits its label',
    async (id) => {
      const { request: req, plan } = await nest(frontsRequest());
      const tags = partTags(plan, req.parts);
      expect(tags).toHaveLength(6);
      const sheet = labelSheet(id);
      const runs = await pdfTextRuns(
        await tagsPdf({ jobName: 'Pemberton vanity, second bathroom upstairs', tags, url: (t) => `http://x/parts/${t.partId}`, units, sheet }),
      );
      const fonts = await helveticaPair();
      const PT = 72 / 25.4;
      const pageH = sheet.page.height * PT;

      tags.forEach((tag, i) => {
        const at = labelOrigin(sheet, i % (sheet.columns * sheet.rows));
        const box = {
          left: at.x * PT,
          right: (at.x + sheet.label.width) * PT,
          top: pageH - at.y * PT,
          bottom: pageH - (at.y + sheet.label.height) * PT,
        };
        const mine = runs.filter(
          (r) => r.page === Math.floor(i / (sheet.columns * sheet.rows)) && r.x >= box.left && r.x < box.right && r.y < box.top && r.y > box.bottom,
        );
        const texts = mine.map((r) => r.text);
        // 23-15/16" x 6-1/2" for a front (formatLength's ascii style), whole, never "23-15/1...".
        const size = `${formatLength(tag.length, units, { style: 'ascii' })} x ${formatLength(tag.width, units, { style: 'ascii' })}`;
        expect(texts).toContain(size);
        expect(texts.some((t) => t.endsWith(` #${tag.instance}`) && (t.startsWith(tag.label) || t.includes('...')))).toBe(true);
        expect(texts).toContain(`Maple ply 23/32"`);
        expect(texts).toContain(`Piece ${tag.pieceName}`);
        // Every line ends before the label's right edge, less its 2 mm margin.
        for (const r of mine)
          expect(r.x + (r.bold ? fonts.bold : fonts.regular).widthOfTextAtSize(r.text, r.size), r.text).toBeLessThanOrEqual(
            box.right - 2 * PT + 0.01,
          );
      });
      // The four fronts are told apart on their tags.
      const fronts = runs.filter((r) => /^Drawer front.* #\d$/.test(r.text)).map((r) => r.text.slice(-2));
      expect(fronts.sort()).toEqual(['#1', '#2', '#3', '#4']);
    },
  );
});

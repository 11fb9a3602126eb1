import { describe, expect, test } from 'vitest';
import { part, request, sheet } from '@/lib/nesting/test-support';
import { formatLength } from '@/lib/units/format-length';
import { inches } from '@/lib/units/length';
import { decodeQr, pdfInfo, pdfLines, type PdfLine } from '@/tests/support/pdf-read';
import { LABEL_SHEETS, labelOrigin, labelSheet, type LabelSheet } from './label-sheets';
import { partTags, type PartTag } from './part-tags';
import { LABEL_PAD_MM, PT_PER_MM, tagBox, tagsPdf } from './tags-pdf';
import { carcassRequest, nest } from './test-plans';

// Read back with Debian's poppler-utils (pdfinfo, pdftotext, pdftoppm) and jsQR.
const units = { system: 'imperial', precision: 16, feet: false } as const;
const plain = (s: string) => s.replace(/\u00a0/g, ' ').replace(/ +/g, ' ');

/** Tag `i`'s label box in points from the page's top-left, and the lines poppler finds inside it, top to bottom. */
function onLabel(lines: PdfLine[], sheet: LabelSheet, i: number) {
  const per = sheet.columns * sheet.rows;
  const at = labelOrigin(sheet, i % per);
  const box = {
    page: Math.floor(i / per),
    left: at.x * PT_PER_MM,
    top: at.y * PT_PER_MM,
    right: (at.x + sheet.label.width) * PT_PER_MM,
    bottom: (at.y + sheet.label.height) * PT_PER_MM,
  };
  const mine = lines
    .filter((l) => l.page === box.page && l.xMin >= box.left && l.xMin < box.right && l.yMin >= box.top && l.yMin < box.bottom)
    .sort((a, b) => a.yMin - b.yMin || a.xMin - b.xMin);
  return { box, mine, text: plain(mine.map((l) => l.text).join(' ')) };
}

/** Every line inside its label: within the 2 mm side margins, and inside the top and bottom edges. */
function expectInside(tag: PartTag, l: PdfLine, box: { left: number; top: number; right: number; bottom: number }) {
  expect(l.xMax, `${tag.label}: ${l.text}`).toBeLessThanOrEqual(box.right - LABEL_PAD_MM * PT_PER_MM + 0.5);
  expect(l.yMin, `${tag.label}: ${l.text}`).toBeGreaterThanOrEqual(box.top - 0.01);
  expect(l.yMax, `${tag.label}: ${l.text}`).toBeLessThanOrEqual(box.bottom + 0.01);
}

describe('the part-tags PDF', () => {
  test.each([
    // Letter 8½ × 11 in = 612 × 792 pt; A4 210 × 297 mm = 595.28 × 841.89 pt (72 pt to the inch, ISO 32000-1).
    ['letter-30', 612, 792],
    ['a4-24', 595.28, 841.89],
  ])('on %s: a page per sheet of labels, at the sheet’s exact size', async (id, w, h) => {
    const { request, plan } = await nest(carcassRequest());
    const tags = partTags(plan, request.parts);
    const sheet = labelSheet(id);
    const info = pdfInfo(await tagsPdf({ jobName: 'Test kitchen', tags, url: (t) => `http://x/parts/${t.partId}`, units, sheet }));
    expect(info.pages).toHaveLength(Math.ceil(tags.length / (sheet.columns * sheet.rows)));
    expect(info.pages[0].width).toBeCloseTo(w, 1);
    expect(info.pages[0].height).toBeCloseTo(h, 1);
  });

  test('more tags than one sheet holds go on to more pages, a full sheet a page; none is dropped', async () => {
    const { request, plan } = await nest(carcassRequest());
    const tags = partTags(plan, request.parts);
    const many = Array.from({ length: 3 }, () => tags).flat();
    const sheet = labelSheet('a4-24');
    const bytes = await tagsPdf({ jobName: 'Ünïcode ☃', tags: many, url: () => 'http://x', units, sheet });
    expect(pdfInfo(bytes).pages).toHaveLength(Math.ceil(many.length / 24));
    // Every tag's number is printed, each on its own label: 24 on each full page.
    const lines = pdfLines(bytes);
    const perPage = (p: number) => lines.filter((l) => l.page === p && /#\d+$/.test(l.text)).length;
    expect(perPage(0)).toBe(24);
    expect(lines.filter((l) => /#\d+$/.test(l.text))).toHaveLength(many.length);
    // The job name as far as the font goes: the snowman it has no glyph for becomes "?".
    expect(lines.filter((l) => l.text === 'Ünïcode ?')).toHaveLength(many.length);
  });

  test('each tag’s QR code reads back (jsQR) as that tag’s own address', async () => {
    const { request: req, plan } = await nest(carcassRequest());
    const tags = partTags(plan, req.parts).slice(0, 4);
    const sheet = labelSheet('letter-30');
    const url = (t: PartTag) => `http://localhost:3000/parts/${t.partId}?plan=58575a7f-ff10-4c30-a7b1-a5948bb8418b&instance=${t.instance}`;
    const bytes = await tagsPdf({ jobName: 'Test kitchen', tags, url, units, sheet });
    const { qrSide } = tagBox(sheet);
    tags.forEach((tag, i) => {
      const at = labelOrigin(sheet, i);
      const x = (at.x + LABEL_PAD_MM) * PT_PER_MM;
      expect(decodeQr(bytes, 0, { x: x - 2, y: at.y * PT_PER_MM, w: qrSide + 4, h: sheet.label.height * PT_PER_MM })).toBe(url(tag));
    });
  });
});

describe('what each tag says (the text printed into the PDF)', () => {
  const frontsRequest = (label = 'Drawer front, upper left bank of the vanity') =>
    request(
      [
        part('front', inches(23 + 15 / 16), inches(6 + 1 / 2), { label, quantity: 4, material: 'Maple ply', thickness: inches(23 / 32) }),
        part('side', inches(34.5), inches(23), { label: 'Side', quantity: 2, material: 'Maple ply', thickness: inches(23 / 32) }),
      ],
      [sheet('ply', inches(96), inches(48), { material: 'Maple ply', thickness: inches(23 / 32) })],
      { kerf: inches(1 / 8) },
    );

  test.each(LABEL_SHEETS.map((s) => [s.id] as const))(
    'on %s every tag carries its whole size as on screen, its whole name and #n, material and thickness, and every line fits its label',
    async (id) => {
      const { request: req, plan } = await nest(frontsRequest());
      const tags = partTags(plan, req.parts);
      expect(tags).toHaveLength(6);
      const sheet = labelSheet(id);
      const lines = pdfLines(
        await tagsPdf({ jobName: 'Pemberton vanity, second bathroom upstairs', tags, url: (t) => `http://x/parts/${t.partId}`, units, sheet }),
      );
      tags.forEach((tag, i) => {
        const { box, mine, text } = onLabel(lines, sheet, i);
        // 23-15/16″ × 6-1/2″ for a front (formatLength's default style, as the tags page shows it), whole.
        const size = `${formatLength(tag.length, units)} × ${formatLength(tag.width, units)}`;
        expect(mine.map((l) => plain(l.text))).toContain(size);
        // The name wraps to two lines rather than being cut; the number is never left off.
        expect(text).toContain(`${tag.label} #${tag.instance}`);
        expect(text).toContain('Pemberton vanity, second bathroom upstairs');
        expect(mine.map((l) => l.text)).toContain('Maple ply 23/32″');
        expect(text).toContain(`Piece ${tag.pieceName}`);
        expect(text).not.toContain('…');
        for (const l of mine) expectInside(tag, l, box);
      });
      // The four fronts are told apart on their tags.
      const fronts = tags
        .map((_, i) => onLabel(lines, sheet, i).text)
        .filter((t) => t.includes('Drawer front'))
        .map((t) => /#(\d) /.exec(t)![1]);
      expect(fronts.sort()).toEqual(['1', '2', '3', '4']);
    },
  );

  test.each(LABEL_SHEETS.map((s) => [s.id] as const))(
    'on %s a name too long for two lines shrinks, then is shortened with a visible "…", keeping its #n; nothing leaves the label',
    async (id) => {
      const long = 'Drawer front for the upper left bank of the island cabinet beside the window, with a finger pull routed along its top edge';
      const { request: req, plan } = await nest(frontsRequest(long));
      const tags = partTags(plan, req.parts);
      const sheet = labelSheet(id);
      const lines = pdfLines(
        await tagsPdf({
          jobName: 'The Hollis-Pemberton family kitchen, butler’s pantry and mudroom renovation, phase two',
          tags,
          url: (t) => `http://x/parts/${t.partId}`,
          units,
          sheet,
        }),
      );
      tags.forEach((tag, i) => {
        const { box, mine, text } = onLabel(lines, sheet, i);
        expect(mine.map((l) => plain(l.text))).toContain(`${formatLength(tag.length, units)} × ${formatLength(tag.width, units)}`);
        if (tag.label === long) {
          expect(text).toMatch(new RegExp(`Drawer front for the upper .*… #${tag.instance} `));
          // Two lines for the name at most: the line holding "#n" and the one above it.
          const nameLines = mine.filter((l) => l.text.startsWith('Drawer') || /… #\d$/.test(l.text));
          expect(nameLines.length).toBeLessThanOrEqual(2);
        } else expect(text).toContain(`Side #${tag.instance}`);
        expect(text).toContain('Maple ply 23/32″');
        for (const l of mine) expectInside(tag, l, box);
      });
    },
  );
});

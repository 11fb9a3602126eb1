import { PDFDocument } from 'pdf-lib';
import { describe, expect, test } from 'vitest';
import { labelSheet } from './label-sheets';
import { partTags } from './part-tags';
import { tagsPdf } from './tags-pdf';
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
    const doc = await PDFDocument.load(await tagsPdf({ jobName: 'Ünïcode ☃', tags: many, url: () => 'http://x', units, sheet: labelSheet('a4-24') }));
    expect(doc.getPageCount()).toBe(Math.ceil(many.length / 24));
  });
});

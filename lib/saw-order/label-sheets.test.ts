import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { LABEL_SHEETS, labelOrigin, labelSheet, paginate } from './label-sheets';

describe('label sheets for part tags', () => {
  test.each(LABEL_SHEETS.map((s) => [s.name, s] as const))('%s: every label lies on the page', (_name, sheet) => {
    const last = labelOrigin(sheet, sheet.columns * sheet.rows - 1);
    expect(last.x + sheet.label.width).toBeLessThanOrEqual(sheet.page.width + 1e-9);
    expect(last.y + sheet.label.height).toBeLessThanOrEqual(sheet.page.height + 1e-9);
  });

  test.each([
    // Letter is 8½ × 11 in (ANSI/ASME Y14.1); the 30-up sheet: 3/16″ + 3 × 2-5/8″ + 2 × 1/8″ + 3/16″ = 8½″ (common practice, no source).
    ['letter-30', 215.9, 279.4],
    // A4 is 210 × 297 mm (ISO 216): 70 × 29.7 mm labels tile it exactly (derived).
    ['a4-30', 210, 297],
  ])('%s fills the page width exactly and is symmetric top and bottom', (id, pageW, pageH) => {
    const sheet = labelSheet(id);
    expect(sheet.page.width).toBeCloseTo(pageW, 9);
    expect(sheet.page.height).toBeCloseTo(pageH, 9);
    const last = labelOrigin(sheet, sheet.columns * sheet.rows - 1);
    expect(last.x + sheet.label.width + sheet.margin.left).toBeCloseTo(pageW, 9);
    expect(pageH - (last.y + sheet.label.height)).toBeCloseTo(sheet.margin.top, 9);
  });

  test('an unknown sheet id falls back to Letter 3 × 10', () => expect(labelSheet('nonsense').id).toBe('letter-30'));

  test('pages hold every item once, in order, no page over-full', () => {
    fc.assert(
      fc.property(fc.array(fc.nat(), { maxLength: 200 }), fc.constantFrom(...LABEL_SHEETS), (items, sheet) => {
        const pages = paginate(items, sheet);
        expect(pages.flat()).toEqual(items);
        for (const p of pages) expect(p.length).toBeLessThanOrEqual(sheet.columns * sheet.rows);
        expect(pages.length).toBe(Math.ceil(items.length / (sheet.columns * sheet.rows)));
      }),
    );
  });
});

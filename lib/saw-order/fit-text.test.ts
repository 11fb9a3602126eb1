import fc from 'fast-check';
import { PDFDocument, StandardFonts, type PDFFont } from 'pdf-lib';
import { beforeAll, describe, expect, test } from 'vitest';
import { fitNameWithSuffix, shrinkToFit, wrapToFit, wrapWords, type Measure } from './fit-text';
import { pdfText } from './pdf-text';

// Widths from pdf-lib's own Helvetica metrics (the Adobe AFM files of the 14 standard fonts).
let helvetica: PDFFont;
let measure: Measure;
beforeAll(async () => {
  helvetica = await (await PDFDocument.create()).embedFont(StandardFonts.HelveticaBold);
  measure = (text, size) => helvetica.widthOfTextAtSize(pdfText(text), size);
});

const seed = 20260609;
const printable = fc.string({ unit: fc.constantFrom(...'abcdefghijklmnopqrstuvwxyz ABCDEFG-/"0123456789'.split('')), minLength: 1, maxLength: 80 });

describe('fitting text into a width', () => {
  test('a length shrinks to fit, whole: 34-1/2" x 23-15/16" in 60 pt', () => {
    const text = '34-1/2" x 23-15/16"';
    const size = shrinkToFit(text, measure, 9, 60);
    expect(size).toBeLessThan(9);
    expect(measure(text, size)).toBeLessThanOrEqual(60);
  });

  test('words wrap, never split, and nothing is lost', () => {
    fc.assert(
      fc.property(printable, fc.integer({ min: 20, max: 200 }), (text, width) => {
        const lines = wrapWords(text, measure, 7.5, width);
        expect(lines.join(' ')).toBe(text.split(/ +/).filter(Boolean).join(' '));
        // Only a line of one word may be wider than the width.
        for (const line of lines) if (measure(line, 7.5) > width) expect(line).not.toContain(' ');
      }),
      { seed },
    );
  });

  test('wrapping to a few lines shrinks the text rather than dropping any of it', () => {
    const text = 'keep offcut 46-1/2" x 15"; waste falls off; B cut on';
    const { lines, size } = wrapToFit(text, measure, 7.5, 138, 2, 5);
    expect(lines.length).toBeLessThanOrEqual(2);
    expect(lines.join(' ')).toBe(text);
    for (const l of lines) expect(measure(l, size)).toBeLessThanOrEqual(138);
  });

  test('a long name is abbreviated before its "#n", which always stays whole', () => {
    fc.assert(
      fc.property(printable, fc.integer({ min: 1, max: 99 }), fc.integer({ min: 40, max: 160 }), (name, n, width) => {
        const suffix = ` #${n}`;
        const fitted = fitNameWithSuffix(name, suffix, measure, 9, width, 7);
        expect(fitted.text.endsWith(`#${n}`)).toBe(true);
        expect(measure(fitted.text, fitted.size)).toBeLessThanOrEqual(width);
        expect(fitted.size).toBeLessThanOrEqual(9);
      }),
      { seed },
    );
  });

  test('four fronts keep their numbers: "Drawer front, upper left #1" … "#4" in 90 pt', () => {
    const texts = [1, 2, 3, 4].map((n) => fitNameWithSuffix('Drawer front, upper left bank', ` #${n}`, measure, 9, 90, 7).text);
    expect(texts.map((t) => t.slice(-2))).toEqual(['#1', '#2', '#3', '#4']);
    expect(new Set(texts).size).toBe(4);
    expect(texts[0]).toMatch(/^Drawer front.*\.\.\. #1$/);
  });

  test('a name that fits is left as it is', () => {
    expect(fitNameWithSuffix('Side', ' #2', measure, 9, 200, 7)).toEqual({ text: 'Side #2', size: 9 });
  });
});

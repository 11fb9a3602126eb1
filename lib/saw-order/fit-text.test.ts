import fc from 'fast-check';
import { beforeAll, describe, expect, test } from 'vitest';
import { pdfFonts } from '@/lib/pdf/measure';
import { fitLines, shrinkToFit, wrapToFit, wrapWords, type Measure } from './fit-text';

// Widths from the shipped PDF font's own metrics (IBM Plex Sans SemiBold, read by fontkit as the PDF renderer reads it).
let measure: Measure;
beforeAll(async () => {
  measure = (await pdfFonts()).measure[600];
});

const seed = 20260609;
const printable = fc.string({ unit: fc.constantFrom(...'abcdefghijklmnopqrstuvwxyz ABCDEFG-/"0123456789'.split('')), minLength: 1, maxLength: 80 });

describe('fitting text into a width', () => {
  test('widths scale with the size and add up (a font’s advance widths, ISO/IEC 14496-22 hmtx)', () => {
    expect(measure('Side', 18)).toBeCloseTo(2 * measure('Side', 9), 9);
    expect(measure('Base side', 9)).toBeGreaterThan(measure('Base', 9) + measure('side', 9));
    expect(measure('', 9)).toBe(0);
  });

  test('a length shrinks to fit, whole: 34-1/2″ × 23-15/16″ in 60 pt', () => {
    const text = '34-1/2″ × 23-15/16″';
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
    const text = 'keep offcut 46-1/2″ × 15″; waste falls off; B cut on';
    const { lines, size } = wrapToFit(text, measure, 7.5, 138, 2, 5);
    expect(lines.length).toBeLessThanOrEqual(2);
    expect(lines.join(' ')).toBe(text);
    for (const l of lines) expect(measure(l, size)).toBeLessThanOrEqual(138);
  });

  test('four fronts keep their numbers: "Drawer front, upper left…" "#1" … "#4" on one line of 90 pt', () => {
    const texts = [1, 2, 3, 4].map((n) => fitLines('Drawer front, upper left bank', ` #${n}`, measure, 9, 90, 1, 7).lines.join(' '));
    expect(texts.map((t) => t.slice(-2))).toEqual(['#1', '#2', '#3', '#4']);
    expect(new Set(texts).size).toBe(4);
    expect(texts[0]).toMatch(/^Drawer front.*… #1$/);
  });

  test('a name that fits is left as it is', () => {
    expect(fitLines('Side', ' #2', measure, 9, 200, 2, 6)).toEqual({ lines: ['Side #2'], size: 9, abbreviated: false });
  });
});

describe('fitting a name on a few lines (part tags)', () => {
  test('every line fits, no more lines than allowed, the "#n" always whole at the end, and the name kept whole unless it says "…"', () => {
    fc.assert(
      fc.property(
        printable,
        fc.integer({ min: 1, max: 99 }),
        fc.integer({ min: 40, max: 160 }),
        fc.integer({ min: 1, max: 3 }),
        (name, n, width, maxLines) => {
          const fitted = fitLines(name, ` #${n}`, measure, 9, width, maxLines, 6);
          expect(fitted.lines.length).toBeLessThanOrEqual(maxLines);
          for (const l of fitted.lines) expect(measure(l, fitted.size), l).toBeLessThanOrEqual(width);
          expect(fitted.lines.at(-1)!.endsWith(`#${n}`)).toBe(true);
          const text = fitted.lines.join(' ');
          if (fitted.abbreviated) expect(text).toMatch(/…/);
          else expect(text).toBe(`${name.split(/ +/).filter(Boolean).join(' ')} #${n}`);
        },
      ),
      { seed },
    );
  });

  test('a long name takes a second line before it shrinks, and is shortened only when two lines at the smallest size cannot hold it', () => {
    const two = fitLines('Drawer front, upper left bank of the vanity', ' #3', measure, 9, 110, 2, 6);
    expect(two).toMatchObject({ size: 9, abbreviated: false });
    expect(two.lines).toHaveLength(2);
    expect(two.lines.join(' ')).toBe('Drawer front, upper left bank of the vanity #3');
    const long = 'Drawer front for the upper left bank of the island cabinet beside the window, with a finger pull routed along its top edge';
    const cut = fitLines(long, ' #3', measure, 9, 110, 2, 6);
    expect(cut.abbreviated).toBe(true);
    expect(cut.size).toBe(6);
    expect(cut.lines.join(' ')).toMatch(/^Drawer front for the .*… #3$/);
    // The longest start that fits: one more word would not.
    const kept = cut.lines.join(' ').replace(/… #3$/, '');
    expect(long.startsWith(kept.trimEnd())).toBe(true);
  });
});

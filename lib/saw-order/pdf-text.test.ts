import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { beforeAll } from 'vitest';
import { pdfFonts } from '@/lib/pdf/measure';
import { pdfText } from './pdf-text';

let has: (ch: string) => boolean;
beforeAll(async () => {
  has = (await pdfFonts()).has;
});

describe('text for the shipped PDF font', () => {
  test.each([
    ['inch and foot marks print as on screen', '1′ 7-3/4″', '1′ 7-3/4″'],
    ['the times sign, ¾ and dashes print as typed', 'Tür × 2 — ¾', 'Tür × 2 — ¾'],
    ['the rounding mark, which the font lacks, becomes a tilde, as formatLength’s ascii style writes it', '≈302 mm', '~302 mm'],
    ['eighths the font lacks are written out, as the screen writes them', '5⅞″ and ⅜″', '5-7/8″ and 3/8″'],
    ['anything else it cannot draw becomes a question mark', '抽屉 ☃', '?? ?'],
    ['line breaks typed into a label become spaces', 'Side\npanel', 'Side panel'],
  ])('%s', (_label, input, output) => expect(pdfText(input, has)).toBe(output));

  test('leaves only characters the font draws (or spaces)', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme' }), (s) => {
        for (const ch of pdfText(s, has)) expect(ch === ' ' || ch === '\u00a0' || has(ch), JSON.stringify(ch)).toBe(true);
      }),
      { seed: 20261203 },
    );
  });
});

describe('PDF file names', () => {
  test.each([
    ['spaces and marks become dashes', 'Hollis kitchen', 'Hollis-kitchen'],
    ['accents are dropped, not the letter', 'Café Ödön', 'Cafe-Odon'],
    ['nothing usable falls back to "plan"', '☃☃', 'plan'],
  ])('%s', async (_label, input, output) => {
    const { pdfFileName } = await import('./pdf-text');
    expect(pdfFileName(input)).toBe(output);
  });
});

import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { pdfText } from './pdf-text';

describe('text for the standard PDF fonts', () => {
  test.each([
    ['inch and foot marks become straight quotes (common practice, no source)', '1′ 7-3/4″', `1' 7-3/4"`],
    ['the rounding mark becomes a tilde, as formatLength’s ascii style writes it', '≈302 mm', '~302 mm'],
    ['Latin-1 letters stay', 'Tür × 2', 'Tür × 2'],
    ['anything else becomes a question mark', '抽屉', '??'],
  ])('%s', (_label, input, output) => expect(pdfText(input)).toBe(output));

  test('never leaves a character outside Latin-1', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme' }), (s) => {
        expect(pdfText(s)).toMatch(/^[\x20-\x7E\xA0-\xFF]*$/);
      }),
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

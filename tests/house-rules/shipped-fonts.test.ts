/**
 * Every character a length, a size or a status can be printed with on a screen is in the fonts the app ships
 * (app/fonts.ts: Plex's Latin faces, then its symbol faces), read from the font files themselves with fontkit — so a
 * length like ³⁄₁₆″ or ≈302 mm is never drawn in whatever font a phone falls back to.
 */
import path from 'node:path';
import * as fontkit from 'fontkit';
import { describe, expect, test } from 'vitest';
import { formatLength, type LengthStyle } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';

const FONTS = path.resolve(import.meta.dirname, '../../app/fonts');
const open = (file: string) => fontkit.openSync(path.join(FONTS, file)) as fontkit.Font;

/** Every unit setting a shop can choose (lib/units/shop-units-check.ts). */
const UNITS: ShopUnits[] = [
  { system: 'imperial', precision: 16, feet: false },
  { system: 'imperial', precision: 16, feet: true },
  { system: 'imperial', precision: 32, feet: false },
  { system: 'imperial', precision: 32, feet: true },
  { system: 'metric', precision: 1, feet: false },
  { system: 'metric', precision: 0.5, feet: false },
];
const STYLES: LengthStyle[] = ['hyphen', 'unicode'];

/** Every 1/128″ from 0 to 100″ and a few lengths off the grid (rounded ones print ≈), negative ones included. */
function lengthCharacters(): Set<string> {
  const chars = new Set<string>();
  const lengths = [...Array.from({ length: 12_801 }, (_, i) => (i * 25.4) / 128), 301.625, 0.3, 1234.567, -19.05, -3.2];
  for (const units of UNITS) for (const style of STYLES) for (const mm of lengths) for (const c of formatLength(mm, units, { style })) chars.add(c);
  return chars;
}

/** Marks the screens print beside lengths: sizes (×), steps (→), done (✓), ranges (–), separators (·). */
const SCREEN_MARKS = ['×', '→', '✓', '–', '—', '·', '−', '…', '″', '′', '“', '”', '’'];

describe.each([
  ['Plex Sans', ['ibm-plex-sans-latin', 'ibm-plex-sans-pi'], ['400', '500', '600', '700']],
  ['Plex Mono', ['ibm-plex-mono-latin', 'ibm-plex-mono-pi'], ['400', '500']],
] as const)('%s as shipped', (_family, [latin, symbols], weights) => {
  test.each(weights)('weight %s draws every character of a length and the marks beside it', (weight) => {
    const faces = [open(`${latin}-${weight}-normal.woff2`), open(`${symbols}-${weight}-normal.woff2`)];
    const missing = [...lengthCharacters(), ...SCREEN_MARKS].filter(
      (c) => c.trim() !== '' && !faces.some((f) => f.hasGlyphForCodePoint(c.codePointAt(0)!)),
    );
    expect(missing).toEqual([]);
  });
});

test('the symbol faces are what the Latin faces lack: the rounding mark and the eighths', () => {
  const latin = open('ibm-plex-sans-latin-400-normal.woff2');
  const symbols = open('ibm-plex-sans-pi-400-normal.woff2');
  for (const c of ['≈', '⅛', '⅜', '⅝', '⅞', '⁵', '₁₆']) {
    for (const ch of c) expect(latin.hasGlyphForCodePoint(ch.codePointAt(0)!) || symbols.hasGlyphForCodePoint(ch.codePointAt(0)!)).toBe(true);
  }
  expect(latin.hasGlyphForCodePoint('≈'.codePointAt(0)!)).toBe(false);
  expect(symbols.hasGlyphForCodePoint('≈'.codePointAt(0)!)).toBe(true);
});

/**
 * Text for the shipped PDF font (IBM Plex Sans, latin): it draws the inch and foot marks, × and ¾, so lengths print
 * as on screen (19-3/4″ × 15″); the few marks it lacks become their plain forms and anything else it cannot draw
 * becomes "?" (never an empty box, never a failed download over one odd part label).
 */
const PLAIN: Record<string, string> = {
  '≈': '~',
  '→': '->',
  '\t': ' ',
  '\n': ' ',
  '\r': ' ',
};

/** `has`: whether the font draws a character (lib/pdf/measure.ts's `pdfFonts().has`). */
const EIGHTHS: Record<string, string> = { '⅛': '1/8', '⅜': '3/8', '⅝': '5/8', '⅞': '7/8' };

export function pdfText(s: string, has: (ch: string) => boolean): string {
  // Eighths the font may lack, written as the screen writes lengths: 5⅞ → 5-7/8.
  const spelled = s.normalize('NFC').replace(/(\d?)([⅛⅜⅝⅞])/g, (m, d: string, f: string) => (has(f) ? m : `${d ? `${d}-` : ''}${EIGHTHS[f]}`));
  return [...spelled].map((ch) => (ch === ' ' || ch === '\u00a0' || has(ch) ? ch : (PLAIN[ch] ?? '?'))).join('');
}

/** A file name any system accepts: letters, digits and dashes. */
export const pdfFileName = (s: string) =>
  s
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 60) || 'plan';

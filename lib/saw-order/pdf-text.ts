/**
 * Text for pdf-lib's standard fonts, which encode only WinAnsi: typographic marks become their plain forms and
 * anything else outside Latin-1 becomes "?" (rather than failing the whole download on one odd part label).
 */
const PLAIN: Record<string, string> = {
  '‘': "'",
  '’': "'",
  '“': '"',
  '”': '"',
  '″': '"',
  '′': "'",
  '—': '-',
  '–': '-',
  '−': '-',
  '≈': '~',
  '…': '...',
  '⁄': '/',
};

export function pdfText(s: string): string {
  return [...s.normalize('NFC')]
    .map((ch) => PLAIN[ch] ?? ch)
    .join('')
    .replace(/[^\x20-\x7E\xA0-\xFF]/g, '?');
}

import { PDFDocument, StandardFonts, type PDFFont } from 'pdf-lib';

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

/** Shortens text with "..." to fit `width` points. */
export function fit(s: string, font: PDFFont, size: number, width: number): string {
  const text = pdfText(s);
  if (font.widthOfTextAtSize(text, size) <= width) return text;
  let lo = 0;
  let hi = text.length;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (font.widthOfTextAtSize(text.slice(0, mid) + '...', size) <= width) lo = mid;
    else hi = mid - 1;
  }
  return text.slice(0, lo) + '...';
}

/** A file name any system accepts: letters, digits and dashes. */
export const pdfFileName = (s: string) => s.normalize('NFKD').replace(/\p{M}/gu, '').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'plan';

/** A new PDF titled for Kerfwise with Helvetica and Helvetica Bold (standard fonts: nothing to embed). */
export async function newPdf(title: string) {
  const doc = await PDFDocument.create();
  doc.setTitle(pdfText(title));
  doc.setCreator('Kerfwise');
  const [regular, bold] = await Promise.all([doc.embedFont(StandardFonts.Helvetica), doc.embedFont(StandardFonts.HelveticaBold)]);
  return { doc, regular, bold };
}

import { PDFDocument, StandardFonts } from 'pdf-lib';

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

/** A file name any system accepts: letters, digits and dashes. */
export const pdfFileName = (s: string) =>
  s
    .normalize('NFKD')
    .replace(/\p{M}/gu, '')
    .replace(/[^A-Za-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 60) || 'plan';

/** A new PDF titled for Kerfwise with Helvetica and Helvetica Bold (standard fonts: nothing to embed). */
export async function newPdf(title: string) {
  const doc = await PDFDocument.create();
  doc.setTitle(pdfText(title));
  doc.setCreator('Kerfwise');
  const [regular, bold] = await Promise.all([doc.embedFont(StandardFonts.Helvetica), doc.embedFont(StandardFonts.HelveticaBold)]);
  return { doc, regular, bold };
}

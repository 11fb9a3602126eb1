/**
 * Part tags as a PDF on a label sheet at its exact size, for printers whose print dialog would scale a web page.
 * Same content as the tags page: job, part and its number, size, material and thickness, grain arrow, stock piece,
 * QR code. Helvetica with ASCII lengths (see saw-order-pdf.ts for why).
 */
import { rgb, type PDFFont } from 'pdf-lib';
import type { ShopUnits } from '@/shared/schemas/units';
import { labelOrigin, paginate, type LabelSheet } from './label-sheets';
import { tagText, type PartTag } from './part-tags';
import { fitNameWithSuffix, shrinkToFit } from './fit-text';
import { newPdf, pdfText } from './pdf-text';
import { qrPath } from './qr-path';

const PT_PER_MM = 72 / 25.4;
const ink = rgb(0, 0, 0);
const mute = rgb(0.4, 0.4, 0.42);

export interface TagsPdfInput {
  jobName: string;
  tags: readonly PartTag[];
  /** The address each tag's QR code leads to. */
  url: (tag: PartTag) => string;
  units: ShopUnits;
  sheet: LabelSheet;
}

export async function tagsPdf(input: TagsPdfInput): Promise<Uint8Array> {
  const { doc, regular, bold } = await newPdf(`Part tags - ${input.jobName}`);
  const { sheet } = input;
  const pageH = sheet.page.height * PT_PER_MM;

  for (const tags of paginate(input.tags, sheet)) {
    const page = doc.addPage([sheet.page.width * PT_PER_MM, pageH]);
    tags.forEach((tag, i) => {
      const at = labelOrigin(sheet, i);
      // Label box in points, with y measured up from the page's bottom as PDF does.
      const x0 = (at.x + 2) * PT_PER_MM;
      const top = pageH - at.y * PT_PER_MM;
      const h = sheet.label.height * PT_PER_MM;
      const qrSide = Math.min(sheet.label.height - 3, sheet.label.width * 0.38) * PT_PER_MM;
      // The whole symbol as one path (runs of dark modules), in QR modules scaled to points.
      const qr = qrPath(input.url(tag));
      page.drawSvgPath(qr.d, { x: x0, y: top - (h - qrSide) / 2, scale: qrSide / qr.size, color: ink, borderWidth: 0 });
      const tx = x0 + qrSide + 1.5 * PT_PER_MM;
      const tw = (at.x + sheet.label.width - 2) * PT_PER_MM - tx;
      const mid = top - h / 2;
      for (const line of tagLines(tag, input, { regular, bold }, tw)) {
        page.drawText(line.text, {
          x: tx + (line.right ? tw - line.font.widthOfTextAtSize(line.text, line.size) : (line.dx ?? 0)),
          y: mid + line.dy,
          size: line.size,
          font: line.font,
          color: line.mute ? mute : ink,
        });
      }
      if (tag.grain) {
        const y = mid - 19;
        page.drawLine({ start: { x: tx, y }, end: { x: tx + 22, y }, thickness: 0.8, color: ink });
        page.drawSvgPath('M 0 0 L -4 -2 L -4 2 Z', { x: tx + 24, y, color: ink });
      }
    });
  }
  return doc.save();
}

export interface TagLine {
  text: string;
  font: PDFFont;
  size: number;
  /** Baseline, points above the label's middle. */
  dy: number;
  mute?: boolean;
  /** Points in from the column's left edge. */
  dx?: number;
  /** Set against the right edge of the text column. */
  right?: boolean;
}

/**
 * The lines of one tag in a text column `width` points wide: the job (abbreviated if it must be), the part with its
 * "#n" (the name shrinks, then is abbreviated; the number never), the size (shrinks, never cut), the material with
 * its thickness (the material abbreviated first), then grain and stock piece.
 */
export function tagLines(
  tag: PartTag,
  input: Pick<TagsPdfInput, 'jobName' | 'units'>,
  fonts: { regular: PDFFont; bold: PDFFont },
  width: number,
): TagLine[] {
  const { regular, bold } = fonts;
  const text = tagText(tag, input.units, 'ascii');
  const measure = (font: PDFFont) => (s: string, size: number) => font.widthOfTextAtSize(pdfText(s), size);
  const job = fitNameWithSuffix(pdfText(input.jobName), '', measure(regular), 6, width, 5);
  const name = fitNameWithSuffix(pdfText(text.name), ` ${text.number}`, measure(bold), 9, width, 6.5);
  const size = shrinkToFit(pdfText(text.size), measure(bold), 8, width, 3);
  const stock = fitNameWithSuffix(pdfText(text.material), ` ${pdfText(text.thickness)}`, measure(regular), 6.5, width, 5);
  const piece = pdfText(text.piece);
  const grain = tag.grain ? 'grain' : 'grain either way';
  return [
    { text: job.text, font: regular, size: job.size, dy: 14, mute: true },
    { text: name.text, font: bold, size: name.size, dy: 5 },
    { text: pdfText(text.size), font: bold, size, dy: -5 },
    { text: stock.text, font: regular, size: stock.size, dy: -13 },
    // With a grain arrow drawn first (0 to 24 pt), the word follows it.
    { text: grain, font: regular, size: 6, dy: -21, mute: true, dx: tag.grain ? 27 : 0 },
    { text: piece, font: regular, size: 6, dy: -21, mute: true, right: true },
  ];
}

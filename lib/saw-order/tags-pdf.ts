/**
 * Part tags as a PDF on a label sheet at its exact size, for printers whose print dialog would scale a web page.
 * Same content as the tags page: job, part, size, grain arrow, QR code. Helvetica with ASCII lengths (see
 * saw-order-pdf.ts for why).
 */
import { rgb, type PDFFont } from 'pdf-lib';
import { formatLength } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';
import { labelOrigin, paginate, type LabelSheet } from './label-sheets';
import type { PartTag } from './part-tags';
import { fit, newPdf } from './pdf-text';
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
  const len = (mm: number) => formatLength(mm, input.units, { style: 'ascii' });
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
      const line = (text: string, y: number, font: PDFFont, size: number, color = ink) => page.drawText(fit(text, font, size, tw), { x: tx, y, size, font, color });
      line(input.jobName, mid + 12, regular, 6, mute);
      line(`${tag.label} #${tag.instance}`, mid + 3, bold, 9);
      line(`${len(tag.length)} x ${len(tag.width)}`, mid - 7, bold, 8);
      if (tag.grain) {
        const y = mid - 14;
        page.drawLine({ start: { x: tx, y }, end: { x: tx + 22, y }, thickness: 0.8, color: ink });
        page.drawSvgPath('M 0 0 L -4 -2 L -4 2 Z', { x: tx + 24, y, color: ink });
        page.drawText('grain', { x: tx + 27, y: y - 2, size: 6, font: regular, color: mute });
      } else {
        page.drawText('grain either way', { x: tx, y: mid - 16, size: 6, font: regular, color: mute });
      }
      const piece = `Piece ${tag.pieceName}`;
      page.drawText(piece, { x: tx + tw - regular.widthOfTextAtSize(piece, 6), y: mid - 16, size: 6, font: regular, color: mute });
    });
  }
  return doc.save();
}

/**
 * The saw order as a PDF: a page per stock piece (a piece with more steps than fit goes on to a continuation
 * page), each step with its diagram, fence setting and the parts it frees, and the saw cautions on every page.
 * Helvetica (a standard PDF font, nothing to embed) with ASCII lengths (19-3/4"), because the app's web fonts are
 * WOFF2, which pdf-lib cannot embed.
 */
import { rgb, type PDFFont, type PDFPage } from 'pdf-lib';
import { SAW_CAUTIONS } from '@/lib/safety';
import { stockPieceName } from '@/lib/nesting/saw-order';
import type { PlanPiece } from '@/shared/schemas/nesting';
import type { ShopUnits } from '@/shared/schemas/units';
import { formatLength } from '@/lib/units/format-length';
import { describeSawOrder, stockPieceTitle, type StepText } from './describe-step';
import { sawOrderGeometry, type StepGeometry } from './step-geometry';
import { fit, newPdf, pdfText } from './pdf-text';

export const PAGE_SIZES = { letter: [612, 792], a4: [595.28, 841.89] } as const;
export type PdfPageSize = keyof typeof PAGE_SIZES;

export interface SawOrderPdfInput {
  title: string;
  subtitle: string;
  units: ShopUnits;
  kerf: number;
  pieces: readonly PlanPiece[];
  pageSize?: PdfPageSize;
}

const MARGIN = 36;
const HEADER = 56;
const CELL_H = 50;
const COLUMNS = 2;
const DIAGRAM = { w: 92, h: 42 };
const CAUTION_SIZE = 7;

const ink = rgb(0.16, 0.16, 0.18);
const mute = rgb(0.45, 0.45, 0.48);
const faint = rgb(0.85, 0.83, 0.8);
const oakWash = rgb(0.96, 0.92, 0.85);
const blade = rgb(0.66, 0.26, 0.18);
const partFill = rgb(0.82, 0.91, 0.83);
/** What a cut leaves, as on screen: the parts it frees in sage, offcuts amber, waste brick; pieces cut on stay plain. */
const ROLE_FILL = { part: partFill, offcut: rgb(0.97, 0.9, 0.75), waste: rgb(0.97, 0.85, 0.82), piece: null } as const;

export async function sawOrderPdf(input: SawOrderPdfInput): Promise<Uint8Array> {
  const { doc, regular, bold } = await newPdf(`Saw order - ${input.title}`);
  const [pw, ph] = PAGE_SIZES[input.pageSize ?? 'letter'];
  const cautionLines = ['Safety: a saw order is a cutting plan, not a safety procedure.', ...SAW_CAUTIONS].map(pdfText);
  const footer = MARGIN + cautionLines.length * (CAUTION_SIZE + 2) + 8;
  const rows = Math.max(1, Math.floor((ph - MARGIN - HEADER - footer) / CELL_H));
  const perPage = rows * COLUMNS;
  const cellW = (pw - 2 * MARGIN) / COLUMNS;

  input.pieces.forEach((piece, index) => {
    const name = stockPieceName(index);
    const title = stockPieceTitle(piece, name, input.units, 'ascii');
    const texts = describeSawOrder(piece, input.units, 'ascii');
    const geometry = sawOrderGeometry(piece, index, input.kerf);
    const pageCount = Math.max(1, Math.ceil(texts.length / perPage));
    for (let pg = 0; pg < pageCount; pg++) {
      const page = doc.addPage([pw, ph]);
      let y = ph - MARGIN - 14;
      page.drawText(fit(`${title.heading}${pg > 0 ? ' (continued)' : ''}`, bold, 16, pw / 2), { x: MARGIN, y, size: 16, font: bold, color: ink });
      page.drawText(fit(input.title, regular, 10, pw / 2 - MARGIN), { x: pw / 2, y: y + 4, size: 10, font: regular, color: ink });
      page.drawText(fit(input.subtitle, regular, 9, pw / 2 - MARGIN), { x: pw / 2, y: y - 8, size: 9, font: regular, color: mute });
      y -= 18;
      const info = `${title.detail} - kerf ${formatLength(input.kerf, input.units, { style: 'ascii' })} - ${texts.length} cuts - fence = width between blade and fence`;
      page.drawText(fit(info, regular, 9, pw - 2 * MARGIN), { x: MARGIN, y, size: 9, font: regular, color: mute });
      if (texts.length === 0) {
        page.drawText('No saw order for this piece yet: save the plan to rebuild its cuts.', { x: MARGIN, y: y - 30, size: 11, font: regular, color: ink });
      }
      const top = ph - MARGIN - HEADER;
      texts.slice(pg * perPage, (pg + 1) * perPage).forEach((text, i) => {
        const col = Math.floor(i / rows);
        const row = i % rows;
        drawStep(page, { x: MARGIN + col * cellW, y: top - (row + 1) * CELL_H, w: cellW }, text, geometry[pg * perPage + i], piece, { regular, bold });
      });
      let cy = footer - 8 - CAUTION_SIZE;
      page.drawLine({ start: { x: MARGIN, y: footer - 2 }, end: { x: pw - MARGIN, y: footer - 2 }, thickness: 0.5, color: faint });
      cautionLines.forEach((line, i) => {
        page.drawText(fit(line, i === 0 ? bold : regular, CAUTION_SIZE, pw - 2 * MARGIN), { x: MARGIN, y: cy, size: CAUTION_SIZE, font: i === 0 ? bold : regular, color: ink });
        cy -= CAUTION_SIZE + 2;
      });
    }
  });
  return doc.save();
}

interface Fonts {
  regular: PDFFont;
  bold: PDFFont;
}

function drawStep(page: PDFPage, cell: { x: number; y: number; w: number }, text: StepText, geo: StepGeometry, piece: PlanPiece, fonts: Fonts) {
  const { regular, bold } = fonts;
  page.drawLine({ start: { x: cell.x, y: cell.y + CELL_H - 1 }, end: { x: cell.x + cell.w - 8, y: cell.y + CELL_H - 1 }, thickness: 0.4, color: faint });
  page.drawText(String(text.n), { x: cell.x, y: cell.y + CELL_H - 20, size: 16, font: bold, color: ink });
  drawDiagram(page, { x: cell.x + 24, y: cell.y + 4 }, geo, piece);
  const tx = cell.x + 24 + DIAGRAM.w + 8;
  const tw = cell.x + cell.w - 8 - tx;
  const head = `${text.kindLabel.toUpperCase()} ${text.piece}${text.trim ? '  - TRIM' : ''}${text.narrow ? '  - SLED / TRACK / BAND SAW' : ''}`;
  page.drawText(fit(head, bold, 9, tw), { x: tx, y: cell.y + CELL_H - 12, size: 9, font: bold, color: text.kind === 'rip' ? blade : ink });
  page.drawText(fit(`Fence ${text.fence}`, bold, 12, tw), { x: tx, y: cell.y + CELL_H - 26, size: 12, font: bold, color: ink });
  const frees = text.frees.length ? `Frees: ${text.frees.join(', ')}` : describeRest(text);
  page.drawText(fit(frees, regular, 7.5, tw), { x: tx, y: cell.y + CELL_H - 37, size: 7.5, font: regular, color: ink });
  const offcut = text.produced.find((p) => p.role === 'offcut');
  if (offcut && text.frees.length) page.drawText(fit(`Keep offcut ${offcut.size}`, regular, 7.5, tw), { x: tx, y: cell.y + CELL_H - 46, size: 7.5, font: regular, color: mute });
}

function describeRest(text: StepText) {
  return pdfText(
    text.produced
      .map((p) => (p.role === 'offcut' ? `keep offcut ${p.size}` : p.role === 'waste' ? 'waste falls off' : `${p.name} cut on`))
      .join('; '),
  );
}

/** The step's diagram in a fixed box: the piece being cut shaded, parts faint, the blade's path and the fence edge. */
function drawDiagram(page: PDFPage, at: { x: number; y: number }, geo: StepGeometry, piece: PlanPiece) {
  const s = Math.min(DIAGRAM.w / piece.length, DIAGRAM.h / piece.width);
  const ox = at.x;
  const oy = at.y + DIAGRAM.h; // the stock's y runs down the page, as on screen
  const box = (r: { x: number; y: number; w: number; h: number }) => ({ x: ox + r.x * s, y: oy - (r.y + r.h) * s, width: r.w * s, height: r.h * s });
  const pt = (x: number, y: number) => ({ x: ox + x * s, y: oy - y * s });
  page.drawRectangle({ ...box({ x: 0, y: 0, w: piece.length, h: piece.width }), borderColor: faint, borderWidth: 0.5 });
  page.drawRectangle({ ...box(geo.piece), color: oakWash, borderColor: mute, borderWidth: 0.6 });
  for (const p of piece.placements) page.drawRectangle({ ...box(p), borderColor: mute, borderWidth: 0.25, borderOpacity: 0.6 });
  for (const p of geo.produces) {
    const fill = ROLE_FILL[p.role];
    if (fill) page.drawRectangle({ ...box(p), color: fill, borderColor: mute, borderWidth: 0.4 });
  }
  page.drawLine({ start: pt(geo.fenceEdge.x1, geo.fenceEdge.y1), end: pt(geo.fenceEdge.x2, geo.fenceEdge.y2), thickness: 2.2, color: ink });
  page.drawLine({ start: pt(geo.line.x1, geo.line.y1), end: pt(geo.line.x2, geo.line.y2), thickness: 1.4, color: blade });
}

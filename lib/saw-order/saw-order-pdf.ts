/**
 * The saw order as a PDF: a page per stock piece (a piece with more steps than fit goes on to a continuation
 * page), each step with its diagram, fence setting and the parts it frees, and the saw cautions on every page.
 * Nothing is cut short: lengths shrink to fit or wrap whole, long notes wrap (see fit-text.ts).
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
import { fitNameWithSuffix, shrinkToFit, wrapToFit, wrapWords } from './fit-text';
import { newPdf, pdfText } from './pdf-text';

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
const MIN_STEP_H = 50;
const COLUMNS = 2;
const DIAGRAM = { w: 92, h: 42 };
const CAUTION_SIZE = 7;
const DETAIL_SIZE = 7.5;
const DETAIL_LEAD = 8.5;

const ink = rgb(0.16, 0.16, 0.18);
const mute = rgb(0.45, 0.45, 0.48);
const faint = rgb(0.85, 0.83, 0.8);
const oakWash = rgb(0.96, 0.92, 0.85);
const blade = rgb(0.66, 0.26, 0.18);
const partFill = rgb(0.82, 0.91, 0.83);
/** What a cut leaves, as on screen: the parts it frees in sage, offcuts amber, waste brick; pieces cut on stay plain. */
const ROLE_FILL = { part: partFill, offcut: rgb(0.97, 0.9, 0.75), waste: rgb(0.97, 0.85, 0.82), piece: null } as const;

interface Fonts {
  regular: PDFFont;
  bold: PDFFont;
}

/** One run of text as drawn: nothing in it is cut short (lengths shrink or wrap whole; only names are abbreviated). */
interface Line {
  text: string;
  font: PDFFont;
  size: number;
  x: number;
  y: number;
  color: ReturnType<typeof rgb>;
}

const measureWith = (font: PDFFont) => (s: string, size: number) => font.widthOfTextAtSize(s, size);

/** Wrapped lines from `top` down, `lead` apart. */
function block(
  text: string,
  font: PDFFont,
  size: number,
  width: number,
  x: number,
  top: number,
  lead: number,
  color: Line['color'],
  maxLines = 3,
  min = 5.5,
): Line[] {
  const fitted = wrapToFit(pdfText(text), measureWith(font), size, width, maxLines, min);
  return fitted.lines.map((line, i) => ({ text: line, font, size: fitted.size, x, y: top - i * lead * (fitted.size / size), color }));
}

export async function sawOrderPdf(input: SawOrderPdfInput): Promise<Uint8Array> {
  const { doc, regular, bold } = await newPdf(`Saw order - ${input.title}`);
  const fonts = { regular, bold };
  const [pw, ph] = PAGE_SIZES[input.pageSize ?? 'letter'];
  const width = pw - 2 * MARGIN;
  // The cautions on every page, wrapped, never cut off.
  const cautions = ['Safety: a saw order is a cutting plan, not a safety procedure.', ...SAW_CAUTIONS].flatMap((c, i) =>
    wrapWords(pdfText(c), measureWith(i === 0 ? bold : regular), CAUTION_SIZE, width).map((text) => ({ text, font: i === 0 ? bold : regular })),
  );
  const footer = MARGIN + cautions.length * (CAUTION_SIZE + 2) + 8;
  const cellW = width / COLUMNS;

  input.pieces.forEach((piece, index) => {
    const name = stockPieceName(index);
    const title = stockPieceTitle(piece, name, input.units, 'ascii');
    const texts = describeSawOrder(piece, input.units, 'ascii');
    const geometry = sawOrderGeometry(piece, index, input.kerf);
    const kerf = formatLength(input.kerf, input.units, { style: 'ascii' });
    const header = (continued: boolean): { lines: Line[]; bottom: number } => {
      const y = ph - MARGIN - 14;
      const heading = pdfText(`${title.heading}${continued ? ' (continued)' : ''}`);
      const job = fitNameWithSuffix(pdfText(input.title), '', measureWith(regular), 10, pw / 2 - MARGIN, 7);
      const lines: Line[] = [
        { text: heading, font: bold, size: shrinkToFit(heading, measureWith(bold), 16, pw / 2 - MARGIN - 8, 9), x: MARGIN, y, color: ink },
        { text: job.text, font: regular, size: job.size, x: pw / 2, y: y + 4, color: ink },
        ...block(input.subtitle, regular, 9, pw / 2 - MARGIN, pw / 2, y - 8, 10, mute, 2),
      ];
      const infoTop = Math.min(y - 18, lines.at(-1)!.y - 12);
      const info = block(
        `${title.detail} - kerf ${kerf} - ${texts.length} cuts - fence = width between blade and fence`,
        regular,
        9,
        width,
        MARGIN,
        infoTop,
        10.5,
        mute,
        3,
      );
      return { lines: [...lines, ...info], bottom: info.at(-1)!.y - 10 };
    };

    // Lay out every step's text first, so each takes the height it needs; then flow them down two columns a page.
    const steps = texts.map((text, i) => ({ ...stepLines(text, cellW, fonts), i }));
    type Placed = { i: number; x: number; top: number; lines: Line[]; h: number };
    const pages: Placed[][] = [];
    let current: Placed[] = [];
    let top0 = header(false).bottom;
    let col = 0;
    let y = top0;
    for (const step of steps) {
      if (y - step.h < footer) {
        col += 1;
        y = top0;
        if (col === COLUMNS) {
          pages.push(current);
          current = [];
          col = 0;
          top0 = header(true).bottom;
          y = top0;
        }
      }
      current.push({ i: step.i, x: MARGIN + col * cellW, top: y, lines: step.lines, h: step.h });
      y -= step.h;
    }
    pages.push(current);

    pages.forEach((placed, pg) => {
      const page = doc.addPage([pw, ph]);
      const head = header(pg > 0);
      for (const l of head.lines) page.drawText(l.text, { x: l.x, y: l.y, size: l.size, font: l.font, color: l.color });
      if (texts.length === 0) {
        page.drawText('No saw order for this piece yet: save the plan to rebuild its cuts.', {
          x: MARGIN,
          y: head.bottom - 24,
          size: 11,
          font: regular,
          color: ink,
        });
      }
      for (const p of placed) {
        page.drawLine({ start: { x: p.x, y: p.top - 1 }, end: { x: p.x + cellW - 8, y: p.top - 1 }, thickness: 0.4, color: faint });
        drawDiagram(page, { x: p.x + 24, y: p.top - 4 - DIAGRAM.h }, geometry[p.i], piece);
        for (const l of p.lines) page.drawText(l.text, { x: p.x + l.x, y: p.top + l.y, size: l.size, font: l.font, color: l.color });
      }
      let cy = footer - 8 - CAUTION_SIZE;
      page.drawLine({ start: { x: MARGIN, y: footer - 2 }, end: { x: pw - MARGIN, y: footer - 2 }, thickness: 0.5, color: faint });
      for (const c of cautions) {
        page.drawText(c.text, { x: MARGIN, y: cy, size: CAUTION_SIZE, font: c.font, color: ink });
        cy -= CAUTION_SIZE + 2;
      }
    });
  });
  return doc.save();
}

/**
 * One step's text, relative to its cell's top-left (y negative downwards): the number, the kind, the fence setting
 * (shrunk to fit, never cut), what it frees or leaves (wrapped), and the offcut to keep. Its height is what the
 * text and the diagram need.
 */
export function stepLines(text: StepText, cellW: number, fonts: Fonts): { lines: Line[]; h: number } {
  const { regular, bold } = fonts;
  const tx = 24 + DIAGRAM.w + 8;
  const tw = cellW - 8 - tx;
  const head = `${text.kindLabel.toUpperCase()} ${text.piece}${text.trim ? '  - TRIM' : ''}${text.narrow ? '  - SLED / TRACK / BAND SAW' : ''}${text.saw ? `  - ON ${text.saw.toUpperCase()}` : ''}`;
  const fence = pdfText(`Fence ${text.fence}`);
  // Top down: the kind (wrapped, it may name the sled), the fence, then what the cut frees or leaves.
  const heading = block(head, bold, 9, tw, tx, -12, 10, text.kind === 'rip' ? blade : ink, 2, 6);
  const fenceY = heading.at(-1)!.y - 14;
  const lines: Line[] = [
    { text: String(text.n), font: bold, size: shrinkToFit(String(text.n), measureWith(bold), 16, 22, 8), x: 0, y: -20, color: ink },
    ...heading,
    { text: fence, font: bold, size: shrinkToFit(fence, measureWith(bold), 12, tw, 6), x: tx, y: fenceY, color: ink },
  ];
  const detail = block(
    text.frees.length ? `Frees: ${text.frees.map(numbered).join(', ')}` : describeRest(text),
    regular,
    DETAIL_SIZE,
    tw,
    tx,
    fenceY - 11,
    DETAIL_LEAD,
    ink,
    3,
  );
  lines.push(...detail);
  const offcut = text.produced.find((p) => p.role === 'offcut');
  if (offcut && text.frees.length)
    lines.push(...block(`Keep offcut ${whole(offcut.size)}`, regular, DETAIL_SIZE, tw, tx, lines.at(-1)!.y - DETAIL_LEAD, DETAIL_LEAD, mute, 2));
  const bottom = Math.min(...lines.map((l) => l.y)) - 5;
  return { lines, h: Math.max(MIN_STEP_H, -bottom) };
}

/** A part's "#n" kept on the line of the word before it. */
const numbered = (label: string) => label.replace(/ (#\d+)$/, '\u00a0$1');
/** A size held together on one line when wrapped (no-break spaces around the ×). */
const whole = (size: string) => size.replace(/ /g, '\u00a0');

function describeRest(text: StepText) {
  return pdfText(
    text.produced
      .map((p) => (p.role === 'offcut' ? `keep offcut ${whole(p.size)}` : p.role === 'waste' ? 'waste falls off' : `${p.name} cut on`))
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

/**
 * The saw order as a PDF, made with @react-pdf/renderer in the font the app ships (IBM Plex Sans), so lengths
 * print as on screen (34-1/2″, 46-1/2″ × 15″). A page per stock piece (a piece with more steps than fit goes on to
 * continuation pages, its header repeated), each step with its diagram, fence setting and the parts it frees, and
 * the saw cautions on every page. Nothing is cut short: the fence setting shrinks to fit its line, everything else
 * wraps whole at spaces (a size is held together with no-break spaces).
 */
import { Document, Line, Page, Path, Rect, Svg, Text, View, renderToBuffer } from '@react-pdf/renderer';
import { SAW_CAUTIONS } from '@/lib/safety';
import { stockPieceName } from '@/lib/nesting/saw-order';
import { pdfFonts, type PdfFonts } from '@/lib/pdf/measure';
import { PDF_BASE_STYLES, PDF_INK, PDF_MUTE, PDF_RULE } from '@/lib/pdf/styles';
import type { PlanPiece } from '@/shared/schemas/nesting';
import type { ShopUnits } from '@/shared/schemas/units';
import { formatLength } from '@/lib/units/format-length';
import { describeSawOrder, stockPieceTitle, type StepText } from './describe-step';
import { sawOrderGeometry, type StepGeometry } from './step-geometry';
import { shrinkToFit, wrapWords } from './fit-text';
import { pdfText } from './pdf-text';

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

export const MARGIN = 36;
const COLUMNS = 2;
const DIAGRAM = { w: 92, h: 42 };
const NUMBER_W = 24;
const CAUTION_SIZE = 7;
const CAUTION_LEAD = 1.3;
const BLADE = '#a8422e';
/** What a cut leaves, as on screen: the parts it frees in sage, offcuts amber, waste brick; pieces cut on stay plain. */
const ROLE_FILL = { part: '#d1e8d4', offcut: '#f7e6bf', waste: '#f7d9d1', piece: null } as const;
const OAK_WASH = '#f5ebd9';
const f = (n: number) => Math.round(n * 100) / 100;

/** What one step shows, in print-ready text: the view the document draws, built before any drawing. */
export interface StepView {
  n: string;
  /** Point size of the number, shrunk for three-digit steps. */
  nSize: number;
  heading: string;
  rip: boolean;
  fence: string;
  fenceSize: number;
  /** "Frees: …" or what the cut leaves; then the offcut to keep, if any. */
  detail: string;
  keep: string | null;
  geometry: StepGeometry;
}

/** One stock piece's pages: its header, its steps in order, and what the diagrams draw. */
export interface PieceView {
  heading: string;
  headingSize: number;
  info: string;
  piece: PlanPiece;
  steps: StepView[];
}

export interface SawOrderView {
  title: string;
  subtitle: string;
  page: readonly [number, number];
  cautions: string[];
  pieces: PieceView[];
}

/** A part's "#n" kept on the line of the word before it. */
const numbered = (label: string) => label.replace(/ (#\d+)$/, '\u00a0$1');
/** A size held together on one line when wrapped (no-break spaces around the ×). */
const whole = (size: string) => size.replace(/ /g, '\u00a0');

function describeRest(text: StepText) {
  return text.produced
    .map((p) => (p.role === 'offcut' ? `keep offcut ${whole(p.size)}` : p.role === 'waste' ? 'waste falls off' : `${p.name} cut on`))
    .join('; ');
}

/** The text column of a step cell, in points. */
export function stepTextWidth(pageWidth: number): number {
  const cellW = (pageWidth - 2 * MARGIN) / COLUMNS;
  return cellW - 8 - (NUMBER_W + DIAGRAM.w + 8);
}

/** Everything the document prints, worked out first: the text cleaned for the font, the sizes that fit. */
export function sawOrderView(input: SawOrderPdfInput, fonts: PdfFonts): SawOrderView {
  const t = (s: string) => pdfText(s, fonts.has);
  const page = PAGE_SIZES[input.pageSize ?? 'letter'];
  const [pw] = page;
  const tw = stepTextWidth(pw);
  const kerf = formatLength(input.kerf, input.units);
  return {
    title: t(input.title),
    subtitle: t(input.subtitle),
    page,
    cautions: ['Safety: a saw order is a cutting plan, not a safety procedure.', ...SAW_CAUTIONS].map(t),
    pieces: input.pieces.map((piece, index) => {
      const title = stockPieceTitle(piece, stockPieceName(index), input.units);
      const texts = describeSawOrder(piece, input.units);
      const geometry = sawOrderGeometry(piece, index, input.kerf);
      const heading = t(title.heading);
      return {
        heading,
        headingSize: shrinkToFit(`${heading} (continued)`, fonts.measure[600], 16, pw / 2 - MARGIN - 8, 9),
        info: t(`${title.detail} · kerf ${kerf} · ${texts.length} cuts · fence = width between blade and fence`),
        piece,
        steps: texts.map((text, i) => {
          const fence = t(`Fence ${text.fence}`);
          const offcut = text.produced.find((p) => p.role === 'offcut');
          return {
            n: String(text.n),
            nSize: shrinkToFit(String(text.n), fonts.measure[600], 16, NUMBER_W - 2, 8),
            // Each mark held together on its line when the heading wraps ("ON CABINET SAW", never "ON CABINET" / "SAW").
            heading: t(
              [
                `${text.kindLabel.toUpperCase()} ${text.piece}`,
                text.trim && 'TRIM',
                text.narrow && 'SLED / TRACK / BAND SAW',
                text.saw && `ON ${text.saw.toUpperCase()}`,
              ]
                .filter(Boolean)
                .map((mark) => whole(mark as string))
                .join(' · '),
            ),
            rip: text.kind === 'rip',
            fence,
            fenceSize: shrinkToFit(fence, fonts.measure[600], 12, tw, 6),
            detail: t(text.frees.length ? `Frees: ${text.frees.map(numbered).join(', ')}` : describeRest(text)),
            keep: offcut && text.frees.length ? t(`Keep offcut ${whole(offcut.size)}`) : null,
            geometry: geometry[i],
          };
        }),
      };
    }),
  };
}

/** Height the cautions take at the foot of every page (measured with the font, wrapped as the page wraps them). */
function cautionsHeight(view: SawOrderView, fonts: PdfFonts): number {
  const width = view.page[0] - 2 * MARGIN;
  const lines = view.cautions.reduce((n, c, i) => n + wrapWords(c, fonts.measure[i === 0 ? 600 : 400], CAUTION_SIZE, width).length, 0);
  // One line to spare, and the rule above them.
  return (lines + 1) * CAUTION_SIZE * CAUTION_LEAD + 8;
}

const s = {
  ...PDF_BASE_STYLES,
  cell: {
    width: '50%',
    flexDirection: 'row',
    paddingTop: 4,
    paddingBottom: 6,
    paddingRight: 8,
    borderTopWidth: 0.4,
    borderTopColor: PDF_RULE,
    minHeight: 50,
  },
  text: { flex: 1, paddingLeft: 8 },
} as const;

/** The step's diagram in a fixed box: the piece being cut shaded, parts faint, the blade's path and the fence edge. */
function Diagram({ geo, piece }: { geo: StepGeometry; piece: PlanPiece }) {
  const k = Math.min(DIAGRAM.w / piece.length, DIAGRAM.h / piece.width);
  const box = (r: { x: number; y: number; w: number; h: number }) => ({ x: r.x * k, y: r.y * k, width: r.w * k, height: r.h * k });
  // Many rectangles as one path each (one drawing operation rather than one element per part: big plans render faster).
  const outlines = (rects: readonly { x: number; y: number; w: number; h: number }[]) =>
    rects.map((r) => `M${f(r.x * k)} ${f(r.y * k)}h${f(r.w * k)}v${f(r.h * k)}h${f(-r.w * k)}z`).join('');
  const seg = (g: { x1: number; y1: number; x2: number; y2: number }) => ({ x1: g.x1 * k, y1: g.y1 * k, x2: g.x2 * k, y2: g.y2 * k });
  return (
    <Svg width={DIAGRAM.w} height={DIAGRAM.h} viewBox={`0 0 ${DIAGRAM.w} ${DIAGRAM.h}`} style={{ marginTop: 2 }}>
      <Rect {...box({ x: 0, y: 0, w: piece.length, h: piece.width })} fill="none" stroke={PDF_RULE} strokeWidth={0.5} />
      <Rect {...box(geo.piece)} fill={OAK_WASH} stroke={PDF_MUTE} strokeWidth={0.6} />
      <Path d={outlines(piece.placements)} fill="none" stroke={PDF_MUTE} strokeWidth={0.25} strokeOpacity={0.6} />
      {(['part', 'offcut', 'waste'] as const).map((role) => {
        const rects = geo.produces.filter((p) => p.role === role);
        return rects.length ? <Path key={role} d={outlines(rects)} fill={ROLE_FILL[role]} stroke={PDF_MUTE} strokeWidth={0.4} /> : null;
      })}
      <Line {...seg(geo.fenceEdge)} stroke={PDF_INK} strokeWidth={2.2} />
      <Line {...seg(geo.line)} stroke={BLADE} strokeWidth={1.4} />
    </Svg>
  );
}

function Step({ step, piece }: { step: StepView; piece: PlanPiece }) {
  return (
    <View style={s.cell} wrap={false}>
      <Text style={{ width: NUMBER_W, fontSize: step.nSize, fontWeight: 600, paddingTop: 4 }}>{step.n}</Text>
      <Diagram geo={step.geometry} piece={piece} />
      {/* One paragraph of nested runs rather than four: the same lines, laid out in one pass (big plans render faster). */}
      <Text style={[s.text, { fontSize: 7.5, lineHeight: 1.2 }]}>
        <Text style={{ fontSize: 9, lineHeight: 1.15, fontWeight: 600, color: step.rip ? BLADE : PDF_INK }}>{step.heading}</Text>
        {'\n'}
        <Text style={{ fontSize: step.fenceSize, lineHeight: 1.25, fontWeight: 600 }}>{step.fence}</Text>
        {'\n'}
        {step.detail}
        {step.keep ? <Text style={{ color: PDF_MUTE }}>{`\n${step.keep}`}</Text> : null}
      </Text>
    </View>
  );
}

function PiecePages({ view, piece, footer }: { view: SawOrderView; piece: PieceView; footer: number }) {
  const rows: StepView[][] = [];
  for (let i = 0; i < piece.steps.length; i += COLUMNS) rows.push(piece.steps.slice(i, i + COLUMNS));
  return (
    <Page size={[view.page[0], view.page[1]]} style={{ ...s.page, padding: MARGIN, paddingBottom: MARGIN + footer }}>
      <View fixed style={{ marginBottom: 8 }}>
        <View style={{ flexDirection: 'row' }}>
          <Text
            style={{ width: '50%', paddingRight: 8, fontSize: piece.headingSize, fontWeight: 600 }}
            render={({ subPageNumber }) => `${piece.heading}${subPageNumber > 1 ? ' (continued)' : ''}`}
          />
          <View style={{ width: '50%' }}>
            <Text style={{ fontSize: 10, lineHeight: 1.2 }}>{view.title}</Text>
            {view.subtitle ? <Text style={{ fontSize: 9, color: PDF_MUTE, lineHeight: 1.2 }}>{view.subtitle}</Text> : null}
          </View>
        </View>
        <Text style={{ fontSize: 9, color: PDF_MUTE, marginTop: 4, lineHeight: 1.2 }}>{piece.info}</Text>
      </View>
      {piece.steps.length === 0 ? (
        <Text style={{ fontSize: 11, marginTop: 16 }}>No saw order for this piece yet: save the plan to rebuild its cuts.</Text>
      ) : null}
      {rows.map((row, i) => (
        <View key={i} style={{ flexDirection: 'row' }} wrap={false}>
          {row.map((step) => (
            <Step key={step.n} step={step} piece={piece.piece} />
          ))}
        </View>
      ))}
      <View
        fixed
        style={{ position: 'absolute', left: MARGIN, right: MARGIN, bottom: MARGIN, borderTopWidth: 0.5, borderTopColor: PDF_RULE, paddingTop: 6 }}
      >
        {view.cautions.map((c, i) => (
          <Text key={i} style={{ fontSize: CAUTION_SIZE, lineHeight: CAUTION_LEAD, fontWeight: i === 0 ? 600 : 400 }}>
            {c}
          </Text>
        ))}
      </View>
    </Page>
  );
}

export function SawOrderDocument({ view, footer }: { view: SawOrderView; footer: number }) {
  return (
    <Document title={`Saw order · ${view.title}`} creator="Kerfwise" producer="Kerfwise">
      {view.pieces.map((piece, i) => (
        <PiecePages key={i} view={view} piece={piece} footer={footer} />
      ))}
    </Document>
  );
}

export async function sawOrderPdf(input: SawOrderPdfInput): Promise<Buffer> {
  const fonts = await pdfFonts();
  const view = sawOrderView(input, fonts);
  return renderToBuffer(<SawOrderDocument view={view} footer={cautionsHeight(view, fonts)} />);
}

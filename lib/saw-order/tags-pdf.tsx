/**
 * Part tags as a PDF on a label sheet at its exact size, for printers whose print dialog would scale a web page,
 * made with @react-pdf/renderer in the font the app ships (IBM Plex Sans), lengths as on screen (34-1/2″ × 23″).
 * Same content as the tags page: job, part and its number, size, material and thickness, grain arrow, stock piece,
 * QR code (the `qrcode` package's symbol, drawn as one vector path). Every line is fitted to its label beforehand
 * with the font's own widths (fit-text.ts): names wrap to two lines and shrink, and only past that are they
 * abbreviated with "…", never the "#n"; the size shrinks and is never cut.
 */
import { Document, Page, Path, Polygon, Line as SvgLine, Svg, Text, View, renderToBuffer } from '@react-pdf/renderer';
import { pdfFonts, type PdfFonts } from '@/lib/pdf/measure';
import { PDF_BASE_STYLES } from '@/lib/pdf/styles';
import type { ShopUnits } from '@/shared/schemas/units';
import { labelOrigin, paginate, type LabelSheet } from './label-sheets';
import { tagText, type PartTag } from './part-tags';
import { fitLines, shrinkToFit } from './fit-text';
import { pdfText } from './pdf-text';
import { qrPath } from './qr-path';

export const PT_PER_MM = 72 / 25.4;
const INK = '#000000';
const MUTE = '#66666b';
/** Inside each label: 2 mm at the sides, 1.5 mm between the QR code and the text. */
export const LABEL_PAD_MM = 2;
const QR_GAP_MM = 1.5;
const LEAD = 1.15;
const GRAIN_ARROW = 24;

export interface TagsPdfInput {
  jobName: string;
  tags: readonly PartTag[];
  /** The address each tag's QR code leads to. */
  url: (tag: PartTag) => string;
  units: ShopUnits;
  sheet: LabelSheet;
}

/** One run of a tag, fitted: its lines all fit the text column at `size`. */
export interface FittedText {
  lines: string[];
  size: number;
}

/** What one tag prints, worked out before drawing. A tag carries its own job, so tags of several jobs can share a sheet. */
export interface TagView {
  job: FittedText;
  name: FittedText;
  size: FittedText;
  stock: FittedText;
  grain: boolean;
  piece: string;
  qr: { size: number; d: string };
}

/** A label's geometry in points: where its text column starts and how wide it is, and the QR code's side. */
export function tagBox(sheet: LabelSheet) {
  const qrSide = Math.min(sheet.label.height - 3, sheet.label.width * 0.38) * PT_PER_MM;
  const textWidth = (sheet.label.width - 2 * LABEL_PAD_MM - QR_GAP_MM) * PT_PER_MM - qrSide;
  return { qrSide, textWidth };
}

/**
 * The lines of one tag in a text column `width` points wide: the job (two lines at most), the part with its "#n"
 * (two lines, shrinking, abbreviated only past that; the number never), the size (one line, shrinks, never cut),
 * the material with its thickness, then grain and stock piece.
 */
export function tagView(tag: PartTag, job: string, units: ShopUnits, url: string, fonts: PdfFonts, width: number): TagView {
  const t = (s: string) => pdfText(s, fonts.has);
  const text = tagText(tag, units);
  const size = t(text.size);
  return {
    job: fitLines(t(job), '', fonts.measure[400], 6, width, 2, 5),
    name: fitLines(t(text.name), ` ${text.number}`, fonts.measure[600], 9, width, 2, 6),
    size: { lines: [size], size: shrinkToFit(size, fonts.measure[600], 8, width, 3) },
    stock: fitLines(t(text.material), ` ${t(text.thickness)}`, fonts.measure[400], 6.5, width, 1, 5),
    grain: tag.grain,
    piece: t(text.piece),
    qr: qrPath(url),
  };
}

const Runs = ({ f, style }: { f: FittedText; style: object }) =>
  f.lines.map((line, i) => (
    <Text key={i} style={{ ...style, fontSize: f.size, lineHeight: LEAD }}>
      {line}
    </Text>
  ));

function Tag({ view, at, sheet }: { view: TagView; at: { x: number; y: number }; sheet: LabelSheet }) {
  const { qrSide } = tagBox(sheet);
  return (
    <View
      style={{
        position: 'absolute',
        left: at.x * PT_PER_MM,
        top: at.y * PT_PER_MM,
        width: sheet.label.width * PT_PER_MM,
        height: sheet.label.height * PT_PER_MM,
        paddingHorizontal: LABEL_PAD_MM * PT_PER_MM,
        flexDirection: 'row',
        alignItems: 'center',
      }}
    >
      <Svg width={qrSide} height={qrSide} viewBox={`0 0 ${view.qr.size} ${view.qr.size}`}>
        <Path d={view.qr.d} fill={INK} />
      </Svg>
      <View style={{ flex: 1, marginLeft: QR_GAP_MM * PT_PER_MM, justifyContent: 'center' }}>
        <Runs f={view.job} style={{ color: MUTE }} />
        <Runs f={view.name} style={{ fontWeight: 600, color: INK }} />
        <Runs f={view.size} style={{ fontWeight: 600, color: INK }} />
        <Runs f={view.stock} style={{ color: INK }} />
        <View style={{ flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between' }}>
          <View style={{ flexDirection: 'row', alignItems: 'center' }}>
            {view.grain ? (
              <Svg width={GRAIN_ARROW + 3} height={5} viewBox={`0 0 ${GRAIN_ARROW + 3} 5`}>
                <SvgLine x1={0} y1={2.5} x2={GRAIN_ARROW - 2} y2={2.5} stroke={INK} strokeWidth={0.8} />
                <Polygon points={`${GRAIN_ARROW},2.5 ${GRAIN_ARROW - 4},0.5 ${GRAIN_ARROW - 4},4.5`} fill={INK} />
              </Svg>
            ) : null}
            <Text style={{ fontSize: 6, color: MUTE, lineHeight: LEAD }}>{view.grain ? 'grain' : 'grain either way'}</Text>
          </View>
          <Text style={{ fontSize: 6, color: MUTE, lineHeight: LEAD }}>{view.piece}</Text>
        </View>
      </View>
    </View>
  );
}

export function TagsDocument({ title, pages, sheet }: { title: string; pages: TagView[][]; sheet: LabelSheet }) {
  return (
    <Document title={title} creator="Kerfwise" producer="Kerfwise">
      {pages.map((views, p) => (
        <Page
          key={p}
          size={[sheet.page.width * PT_PER_MM, sheet.page.height * PT_PER_MM]}
          style={{ ...PDF_BASE_STYLES.page, padding: 0, paddingBottom: 0 }}
        >
          {views.map((view, i) => (
            <Tag key={i} view={view} at={labelOrigin(sheet, i)} sheet={sheet} />
          ))}
        </Page>
      ))}
    </Document>
  );
}

export async function tagsPdf(input: TagsPdfInput): Promise<Buffer> {
  const fonts = await pdfFonts();
  const { textWidth } = tagBox(input.sheet);
  const views = input.tags.map((tag) => tagView(tag, input.jobName, input.units, input.url(tag), fonts, textWidth));
  return renderToBuffer(
    <TagsDocument title={pdfText(`Part tags · ${input.jobName}`, fonts.has)} pages={paginate(views, input.sheet)} sheet={input.sheet} />,
  );
}

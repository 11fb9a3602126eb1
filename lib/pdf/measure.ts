/**
 * Measuring and cleaning text for the shipped PDF font, with the very font objects @react-pdf/renderer lays out
 * with (fontkit's, loaded through its font store), so a width computed here is the width the PDF draws.
 */
import { Font } from '@react-pdf/renderer';
import type { Measure } from '@/lib/saw-order/fit-text';
import { PDF_FONT_FAMILY, registerPdfFonts } from './fonts';

export type PdfWeight = 400 | 600;

interface LoadedFont {
  unitsPerEm: number;
  layout(text: string): { advanceWidth: number };
  hasGlyphForCodePoint(codePoint: number): boolean;
}

export interface PdfFonts {
  /** Width of a text at a size, in points, in the regular or the semibold face. */
  measure: Record<PdfWeight, Measure>;
  /** Whether the shipped font draws this character (both faces carry the same set). */
  has: (ch: string) => boolean;
}

let loaded: Promise<PdfFonts> | null = null;

/** Loads the shipped faces once per process. */
export function pdfFonts(): Promise<PdfFonts> {
  loaded ??= (async () => {
    registerPdfFonts();
    const load = async (fontWeight: PdfWeight) => {
      const source = Font.getFont({ fontFamily: PDF_FONT_FAMILY, fontWeight });
      await source.load();
      if (!source.data) throw new Error(`The PDF font ${PDF_FONT_FAMILY} ${fontWeight} did not load.`);
      return source.data as unknown as LoadedFont;
    };
    const [regular, semibold] = await Promise.all([load(400), load(600)]);
    const measureWith = (font: LoadedFont): Measure => {
      // Widths at 1 pt, cached: tags and saw orders measure the same few strings many times.
      const cache = new Map<string, number>();
      return (text, size) => {
        let w = cache.get(text);
        if (w === undefined) {
          w = font.layout(text).advanceWidth / font.unitsPerEm;
          cache.set(text, w);
        }
        return w * size;
      };
    };
    return {
      measure: { 400: measureWith(regular), 600: measureWith(semibold) },
      has: (ch) => regular.hasGlyphForCodePoint(ch.codePointAt(0)!) && semibold.hasGlyphForCodePoint(ch.codePointAt(0)!),
    };
  })();
  return loaded;
}

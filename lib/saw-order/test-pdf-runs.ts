/**
 * For tests: the text a PDF draws, read back from its page content streams (pdf-lib writes each drawText as
 * `/Font size Tf`, `1 0 0 1 x y Tm`, `<hex> Tj`), with its font, size and position, so a test can check that every
 * length is drawn whole and that each run fits where it stands.
 */
import { decodePDFRawStream, PDFArray, PDFDocument, PDFRawStream, StandardFonts, type PDFFont } from 'pdf-lib';

export interface TextRun {
  page: number;
  text: string;
  bold: boolean;
  size: number;
  x: number;
  y: number;
}

export async function pdfTextRuns(bytes: Uint8Array): Promise<TextRun[]> {
  const doc = await PDFDocument.load(bytes);
  const runs: TextRun[] = [];
  doc.getPages().forEach((page, index) => {
    const contents = page.node.Contents();
    const refs = contents instanceof PDFArray ? contents.asArray() : contents ? [contents] : [];
    let font = '';
    let size = 0;
    let x = 0;
    let y = 0;
    for (const ref of refs) {
      const stream = doc.context.lookup(ref);
      if (!(stream instanceof PDFRawStream)) continue;
      const source = new TextDecoder('latin1').decode(decodePDFRawStream(stream).decode());
      for (const m of source.matchAll(/\/(\S+) ([\d.]+) Tf|1 0 0 1 (-?[\d.]+) (-?[\d.]+) Tm|<([0-9A-Fa-f]*)> Tj/g)) {
        if (m[1]) [font, size] = [m[1], Number(m[2])];
        else if (m[3]) [x, y] = [Number(m[3]), Number(m[4])];
        else {
          const hex = m[5];
          const text = String.fromCharCode(...(hex.match(/../g) ?? []).map((h) => parseInt(h, 16)));
          runs.push({ page: index, text, bold: /Bold/.test(font), size, x, y });
        }
      }
    }
  });
  return runs;
}

/** Helvetica and Helvetica Bold, to measure runs with the same metrics the PDF was laid out with. */
export async function helveticaPair(): Promise<{ regular: PDFFont; bold: PDFFont }> {
  const doc = await PDFDocument.create();
  const [regular, bold] = await Promise.all([doc.embedFont(StandardFonts.Helvetica), doc.embedFont(StandardFonts.HelveticaBold)]);
  return { regular, bold };
}

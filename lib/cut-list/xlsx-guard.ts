import { Unzip, UnzipInflate } from 'fflate';
import { UPLOAD_LIMITS } from './limits';

/**
 * Limits on what an XLSX file may unpack to. An .xlsx is a zip: a file under the upload limit can inflate to
 * hundreds of megabytes (a "zip bomb": one took 77 s and 2.6 GB in the reader, then crashed). Before the workbook is
 * read, its parts are inflated as a stream and counted, and the count stops at these limits.
 */
export const XLSX_LIMITS = {
  /** Bytes all the workbook's parts together may inflate to (a 1,000-row cut list is well under 2 MB). */
  maxInflatedBytes: 40 * 1024 * 1024,
  /** Cells in all worksheets together: every row and column the upload allows, ten times over. */
  maxCells: (UPLOAD_LIMITS.maxRows + 1) * UPLOAD_LIMITS.maxColumns * 10,
} as const;

/** Compressed bytes handed to the inflater at a time: what one step can unpack is bounded by deflate's ratio. */
const STEP = 4 * 1024;
const CELL = /<c[\s>/]/g;

export type XlsxGuardResult = { ok: true; inflatedBytes: number; cells: number } | { ok: false; error: string; inflatedBytes: number };

const mb = (bytes: number) => `${Math.round(bytes / (1024 * 1024))} MB`;

/** Inflates the workbook's parts as a stream, counting bytes and worksheet cells, and stops at the limits. */
export function checkXlsxSize(bytes: Uint8Array, limits: { maxInflatedBytes: number; maxCells: number } = XLSX_LIMITS): XlsxGuardResult {
  let inflated = 0;
  let cells = 0;
  let stop: string | null = null;
  let broken: string | null = null;
  const unzip = new Unzip((file) => {
    if (stop) return file.terminate();
    const isSheet = /^xl\/worksheets\/[^/]+\.xml$/i.test(file.name);
    let carry = '';
    file.ondata = (err, chunk) => {
      if (err) {
        broken = err.message;
        return;
      }
      if (stop) return;
      inflated += chunk.length;
      if (inflated > limits.maxInflatedBytes) {
        stop = `This workbook unpacks to more than ${mb(limits.maxInflatedBytes)}, far more than any cut list needs. Save the sheet again (or as CSV) and try that.`;
        file.terminate();
        return;
      }
      if (isSheet) {
        // Counted on latin1 text: the tag is ASCII, and a tag split across two chunks is caught by the carry.
        let text = carry;
        for (let i = 0; i < chunk.length; i += 32768) text += String.fromCharCode(...chunk.subarray(i, Math.min(i + 32768, chunk.length)));
        cells += (text.match(CELL) ?? []).length;
        carry = text.slice(-3);
        cells -= (carry.match(CELL) ?? []).length;
        if (cells > limits.maxCells) {
          stop = `This workbook has more than ${limits.maxCells.toLocaleString('en-US')} cells; a cut list is at most ${UPLOAD_LIMITS.maxRows.toLocaleString('en-US')} rows of ${UPLOAD_LIMITS.maxColumns} columns. Remove the sheets and cells it does not need.`;
          file.terminate();
        }
      }
    };
    file.start();
  });
  unzip.register(UnzipInflate);
  try {
    for (let at = 0; at < bytes.length && !stop && !broken; at += STEP) unzip.push(bytes.subarray(at, at + STEP), at + STEP >= bytes.length);
  } catch (e) {
    broken = e instanceof Error ? e.message : String(e);
  }
  if (stop) return { ok: false, error: stop, inflatedBytes: inflated };
  if (broken) return { ok: false, error: `That file could not be read as an Excel workbook (.xlsx): ${broken}`, inflatedBytes: inflated };
  return { ok: true, inflatedBytes: inflated, cells };
}

import { UPLOAD_EXTENSIONS, UPLOAD_LIMITS } from './limits';
import { readCsv } from './read-csv';
import { readXlsx } from './read-xlsx';

export type ReadFileResult = { ok: true; grid: string[][] } | { ok: false; error: string };

const kib = (bytes: number) => `${Math.round(bytes / 1024)} KB`;

/**
 * Reads a chosen file (CSV or XLSX) into rows of text cells, refusing files over the limits with a message that
 * says which limit and by how much. Cells that are too long are left for row validation, so one bad cell does not
 * hide the rest of the file.
 */
export async function readCutListFile(file: { name: string; bytes: ArrayBuffer }): Promise<ReadFileResult> {
  const name = file.name.toLowerCase();
  const ext = UPLOAD_EXTENSIONS.find((e) => name.endsWith(e));
  if (!ext) return { ok: false, error: `“${file.name}” is not a CSV or Excel (.xlsx) file. Save the sheet as CSV or .xlsx and try again.` };
  if (file.bytes.byteLength > UPLOAD_LIMITS.maxFileBytes)
    return {
      ok: false,
      error: `“${file.name}” is ${kib(file.bytes.byteLength)}; the limit is ${kib(UPLOAD_LIMITS.maxFileBytes)}. Split it into smaller files.`,
    };
  if (file.bytes.byteLength === 0) return { ok: false, error: `“${file.name}” is empty.` };

  const read = ext === '.xlsx' ? await readXlsx(file.bytes) : readText(file.bytes);
  if (!read.ok) return read;
  const { grid } = read;
  if (grid.length === 0) return { ok: false, error: `“${file.name}” has no rows.` };
  if (grid.length > UPLOAD_LIMITS.maxRows + 1)
    return {
      ok: false,
      error: `“${file.name}” has ${grid.length.toLocaleString('en-US')} rows; the limit is ${UPLOAD_LIMITS.maxRows.toLocaleString('en-US')} rows (plus a header). Split it into smaller files.`,
    };
  const widest = Math.max(...grid.map((r) => r.length));
  if (widest > UPLOAD_LIMITS.maxColumns)
    return {
      ok: false,
      error: `“${file.name}” has ${widest} columns; the limit is ${UPLOAD_LIMITS.maxColumns}. Remove the columns the cut list does not need.`,
    };
  return { ok: true, grid };
}

function readText(bytes: ArrayBuffer): ReadFileResult {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return { ok: false, error: 'The file is not UTF-8 text. Save it from the spreadsheet as “CSV UTF-8” and try again.' };
  }
  if (text.includes('\u0000')) return { ok: false, error: 'The file contains binary data, not CSV text.' };
  return readCsv(text);
}

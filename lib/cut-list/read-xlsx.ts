import { readSheet } from 'read-excel-file/universal';
import { checkXlsxSize } from './xlsx-guard';

/** The first worksheet of an XLSX file as text cells; dates and numbers as the sheet stores them. */
export async function readXlsx(bytes: ArrayBuffer): Promise<{ ok: true; grid: string[][] } | { ok: false; error: string }> {
  // Unpacked and counted first, with limits: the reader itself would inflate a zip bomb whole.
  const guard = checkXlsxSize(new Uint8Array(bytes));
  if (!guard.ok) return { ok: false, error: guard.error };
  try {
    const rows = await readSheet(bytes);
    const grid = rows.map((row) =>
      row.map((cell) => (cell === null || cell === undefined ? '' : cell instanceof Date ? cell.toISOString().slice(0, 10) : String(cell))),
    );
    while (grid.length && grid[grid.length - 1].every((c) => c.trim() === '')) grid.pop();
    return { ok: true, grid };
  } catch (e) {
    return { ok: false, error: `That file could not be read as an Excel workbook (.xlsx): ${e instanceof Error ? e.message : String(e)}` };
  }
}

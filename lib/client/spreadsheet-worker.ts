/**
 * Reads a chosen cut-list file (CSV or XLSX) in a Web Worker (`workers/spreadsheet.worker.ts`), so a big or hostile
 * workbook never freezes the page. A read that takes longer than `timeoutMs` is stopped with a message. Browser only.
 */
import * as Comlink from 'comlink';
import type { ReadFileResult } from '@/lib/cut-list/read-cut-list-file';

type SpreadsheetWorkerApi = { readCutListFile(file: { name: string; bytes: ArrayBuffer }): Promise<ReadFileResult> };

export async function readCutListFileInWorker(file: { name: string; bytes: ArrayBuffer }, timeoutMs = 20_000): Promise<ReadFileResult> {
  const worker = new Worker(new URL('../../workers/spreadsheet.worker.ts', import.meta.url), { type: 'module', name: 'kerfwise-spreadsheet' });
  const remote = Comlink.wrap<SpreadsheetWorkerApi>(worker);
  let timer: ReturnType<typeof setTimeout> | undefined;
  const timeout = new Promise<ReadFileResult>((resolve) => {
    timer = setTimeout(
      () =>
        resolve({
          ok: false,
          error: `“${file.name}” took too long to read (over ${Math.round(timeoutMs / 1000)} s). Save it as CSV, or split it, and try again.`,
        }),
      timeoutMs,
    );
  });
  try {
    return await Promise.race([remote.readCutListFile(Comlink.transfer(file, [file.bytes])), timeout]);
  } catch (e) {
    return { ok: false, error: `“${file.name}” could not be read: ${e instanceof Error ? e.message : String(e)}` };
  } finally {
    clearTimeout(timer);
    worker.terminate();
  }
}

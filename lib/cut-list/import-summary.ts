import { countOf, listed } from '@/lib/plural';

/** What an import says when it is done, in plain words: "Imported 2 rows from “a.csv”. Left out row 3, which has a problem." */
export function importSummary(result: { imported: number; skipped: number; skippedLines: readonly number[] }, fileName: string): string {
  const done = `Imported ${countOf(result.imported, 'row')} from “${fileName}”.`;
  if (result.skipped === 0) return done;
  const lines = result.skippedLines;
  const which = lines.length === 1 ? `row ${lines[0]}, which has a problem` : `rows ${listed(lines)}, which have problems`;
  return `${done} Left out ${which}.`;
}

import type { CutListField, CutListUpload } from '@/shared/schemas/cut-list-upload';

/**
 * The part of a read file that is sent to the server: only the mapped columns, in mapping order, each row with its
 * line number in the file. Blank rows are left out (they hold nothing to lose); the count is returned to show.
 */
export function toUploadRows(
  grid: readonly string[][],
  mapping: readonly (CutListField | null)[],
  { hasHeader }: { hasHeader: boolean },
): { columns: CutListField[]; rows: CutListUpload['rows']; blankRows: number } {
  const picked = mapping.flatMap((field, index) => (field ? [{ field, index }] : []));
  const rows: CutListUpload['rows'] = [];
  let blankRows = 0;
  grid.forEach((row, i) => {
    if (hasHeader && i === 0) return;
    if (row.every((c) => c.trim() === '')) {
      blankRows++;
      return;
    }
    rows.push({ line: i + 1, cells: picked.map(({ index }) => row[index] ?? '') });
  });
  return { columns: picked.map((p) => p.field), rows, blankRows };
}

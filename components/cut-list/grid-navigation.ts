/**
 * How the cut list's keyboard moves between cells, like a spreadsheet: ↑ and ↓ go a row up or down; ← and → go a
 * cell left or right once the caret is at the text's edge (or the whole text is selected, or the cell is not a text
 * box); Enter goes a row down, and on the new-part row adds the part. Data in, data out: the table applies the move.
 */

/** A cell by its row (0-based; the new-part row is the last) and column. */
export interface CellAt {
  row: number;
  col: number;
}

/** Where the caret stands in a text box; a button or a read-only cell has none (`null`). */
export interface Caret {
  selectionStart: number | null;
  selectionEnd: number | null;
  length: number;
}

export type GridKeyOutcome =
  /** Focus this cell (the key's default is prevented). */
  | { kind: 'move'; to: CellAt }
  /** Enter on the new-part row: add it (the key's default is prevented). */
  | { kind: 'add-part' }
  /** Leave the key to the browser: the caret moves in the text, a button presses. */
  | { kind: 'none' };

const NONE: GridKeyOutcome = { kind: 'none' };

/**
 * What a key does in the grid. `caret` is null for a cell that is not a text box; `onButton` for a button (Enter
 * presses it); `newPartRow` is the index of the new-part row.
 */
export function gridKey(key: string, at: CellAt, caret: Caret | null, onButton: boolean, newPartRow: number): GridKeyOutcome {
  const whole = caret ? caret.selectionStart === 0 && caret.selectionEnd === caret.length : true;
  const move = (row: number, col: number): GridKeyOutcome => ({ kind: 'move', to: { row, col } });
  switch (key) {
    case 'ArrowUp':
      return move(at.row - 1, at.col);
    case 'ArrowDown':
      return move(at.row + 1, at.col);
    case 'ArrowLeft':
      return whole || (caret?.selectionStart === 0 && caret.selectionEnd === 0) ? move(at.row, at.col - 1) : NONE;
    case 'ArrowRight':
      return whole || (caret && caret.selectionStart === caret.length) ? move(at.row, at.col + 1) : NONE;
    case 'Enter':
      if (onButton) return NONE;
      return at.row === newPartRow ? { kind: 'add-part' } : move(at.row + 1, at.col);
    default:
      return NONE;
  }
}

/** A cell kept inside the grid: rows 0…newPartRow, columns 0…columns − 1. */
export const clampCell = ({ row, col }: CellAt, newPartRow: number, columns: number): CellAt => ({
  row: Math.max(0, Math.min(row, newPartRow)),
  col: Math.max(0, Math.min(col, columns - 1)),
});

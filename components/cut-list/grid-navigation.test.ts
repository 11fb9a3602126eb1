import { describe, expect, test } from 'vitest';
import { clampCell, gridKey, type Caret } from './grid-navigation';

// The moves of a spreadsheet's keyboard: arrows between cells, ← → only from the text's edge, Enter down a row
// (common practice, no source).
const at = { row: 2, col: 3 };
const NEW_ROW = 5;
const caret = (selectionStart: number, selectionEnd: number, length: number): Caret => ({ selectionStart, selectionEnd, length });

describe('gridKey', () => {
  test('↑ and ↓ go a row up or down wherever the caret is', () => {
    expect(gridKey('ArrowUp', at, caret(2, 2, 5), false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 1, col: 3 } });
    expect(gridKey('ArrowDown', at, caret(2, 2, 5), false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 3, col: 3 } });
  });

  test('← leaves the cell from the start of its text, or when all of it is selected; otherwise the caret moves', () => {
    expect(gridKey('ArrowLeft', at, caret(0, 0, 5), false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 2, col: 2 } });
    expect(gridKey('ArrowLeft', at, caret(0, 5, 5), false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 2, col: 2 } });
    expect(gridKey('ArrowLeft', at, caret(3, 3, 5), false, NEW_ROW)).toEqual({ kind: 'none' });
    expect(gridKey('ArrowLeft', at, caret(0, 2, 5), false, NEW_ROW)).toEqual({ kind: 'none' });
  });

  test('→ leaves the cell from the end of its text, or when all of it is selected; otherwise the caret moves', () => {
    expect(gridKey('ArrowRight', at, caret(5, 5, 5), false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 2, col: 4 } });
    expect(gridKey('ArrowRight', at, caret(0, 5, 5), false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 2, col: 4 } });
    expect(gridKey('ArrowRight', at, caret(1, 1, 5), false, NEW_ROW)).toEqual({ kind: 'none' });
  });

  test('an empty cell is all selected: ← and → leave it', () => {
    expect(gridKey('ArrowLeft', at, caret(0, 0, 0), false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 2, col: 2 } });
    expect(gridKey('ArrowRight', at, caret(0, 0, 0), false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 2, col: 4 } });
  });

  test('a cell that is not a text box (a read-only size, the grain button) moves on every arrow', () => {
    expect(gridKey('ArrowLeft', at, null, true, NEW_ROW)).toEqual({ kind: 'move', to: { row: 2, col: 2 } });
    expect(gridKey('ArrowRight', at, null, false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 2, col: 4 } });
  });

  test('Enter goes a row down, adds the part on the new-part row, and is left to a button to press it', () => {
    expect(gridKey('Enter', at, caret(1, 1, 4), false, NEW_ROW)).toEqual({ kind: 'move', to: { row: 3, col: 3 } });
    expect(gridKey('Enter', { row: NEW_ROW, col: 0 }, caret(0, 0, 0), false, NEW_ROW)).toEqual({ kind: 'add-part' });
    expect(gridKey('Enter', { row: NEW_ROW, col: 5 }, null, true, NEW_ROW)).toEqual({ kind: 'none' });
  });

  test('other keys are the browser’s', () => {
    expect(gridKey('Tab', at, caret(0, 0, 3), false, NEW_ROW)).toEqual({ kind: 'none' });
    expect(gridKey('a', at, caret(0, 0, 3), false, NEW_ROW)).toEqual({ kind: 'none' });
  });
});

describe('clampCell', () => {
  test('keeps a move inside the grid: no row above the first or below the new-part row, no column outside', () => {
    expect(clampCell({ row: -1, col: 2 }, NEW_ROW, 9)).toEqual({ row: 0, col: 2 });
    expect(clampCell({ row: NEW_ROW + 1, col: 2 }, NEW_ROW, 9)).toEqual({ row: NEW_ROW, col: 2 });
    expect(clampCell({ row: 1, col: -1 }, NEW_ROW, 9)).toEqual({ row: 1, col: 0 });
    expect(clampCell({ row: 1, col: 9 }, NEW_ROW, 9)).toEqual({ row: 1, col: 8 });
    expect(clampCell({ row: 3, col: 4 }, NEW_ROW, 9)).toEqual({ row: 3, col: 4 });
  });
});

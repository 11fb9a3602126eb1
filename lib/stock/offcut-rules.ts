import type { Mm } from '@/lib/units/length';

export interface Rect {
  w: Mm;
  h: Mm;
}

/** An offcut is worth keeping when its long side reaches the shop's minimum length and its short side the minimum width. */
export function isKeepableOffcut(rect: Rect, { minLength, minWidth }: { minLength: Mm; minWidth: Mm }): boolean {
  const long = Math.max(rect.w, rect.h);
  const short = Math.min(rect.w, rect.h);
  return short > 0 && long >= minLength && short >= minWidth;
}

/**
 * An offcut's share of its stock piece's cost, by area: what the shop paid for that part of the sheet, so the rack's
 * value and a later plan's cost stay honest. Whole cents, never more than the piece.
 */
export function offcutCostCents(offcut: Rect, piece: Rect, pieceCostCents: number): number {
  const pieceArea = piece.w * piece.h;
  if (!(pieceArea > 0) || !(pieceCostCents > 0)) return 0;
  return Math.min(pieceCostCents, Math.round((pieceCostCents * offcut.w * offcut.h) / pieceArea));
}

/** Offcut length runs along the stock's length (x); a grainless offcut is measured long side first. */
export function offcutSize(rect: Rect, grain: 'along-length' | 'none'): { length: Mm; width: Mm } {
  if (grain === 'none') return { length: Math.max(rect.w, rect.h), width: Math.min(rect.w, rect.h) };
  return { length: rect.w, width: rect.h };
}

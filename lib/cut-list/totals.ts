import { boardFeet } from '@/lib/lumber/board-feet';
import { isSolidWood, type StockOffer } from './stock-match';

export interface CutListTotals {
  /** Pieces to cut: quantities summed. */
  pieces: number;
  rows: number;
  /** Face area of every piece, mm². */
  areaMm2: number;
  /** Net board feet of the solid-wood pieces (finished sizes, before waste). */
  boardFeet: number;
  solidPieces: number;
}

export function cutListTotals(
  parts: readonly { quantity: number; length: number; width: number; thickness: number; material: string }[],
  offers: readonly StockOffer[],
): CutListTotals {
  const totals: CutListTotals = { pieces: 0, rows: parts.length, areaMm2: 0, boardFeet: 0, solidPieces: 0 };
  for (const p of parts) {
    totals.pieces += p.quantity;
    totals.areaMm2 += p.length * p.width * p.quantity;
    if (isSolidWood(p.material, offers)) {
      totals.solidPieces += p.quantity;
      totals.boardFeet += p.quantity * boardFeet({ thickness: { mm: p.thickness }, width: p.width, length: p.length });
    }
  }
  return totals;
}

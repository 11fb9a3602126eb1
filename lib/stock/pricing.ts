/**
 * What a piece of stock costs. Sheets are priced each; boards by the board foot on their nominal thickness when it is
 * quartered ("4/4" = 1″), otherwise on their actual thickness (AHEC, "Measurement": BF = T″ × W″ × L′ / 12).
 */
import { boardFeet } from '@/lib/lumber/board-feet';

const QUARTERS = /^\s*(\d+)\s*\/\s*4\s*$/;

export interface PricedSize {
  kind: 'sheet' | 'board';
  nominalThickness: string;
  thickness: number;
  length: number;
  width: number;
  /** Per sheet, or per board foot for boards, in minor units. */
  costCents: number;
}

/** Board feet of one board: quartered stock on its nominal thickness, anything else on its actual one. */
export function pieceBoardFeet(size: Pick<PricedSize, 'nominalThickness' | 'thickness' | 'length' | 'width'>): number {
  const q = QUARTERS.exec(size.nominalThickness);
  return boardFeet({ thickness: q ? { quarters: Number(q[1]) } : { mm: size.thickness }, width: size.width, length: size.length });
}

/** The cost of one piece in minor units, rounded to the unit. */
export function costEachCents(size: PricedSize): number {
  return size.kind === 'sheet' ? size.costCents : Math.round(size.costCents * pieceBoardFeet(size));
}

import { BOARD_FEET_PER_CUBIC_METRE } from './board-feet';

/** What stock costs at a price per board foot. */
export function boardFootCost(boardFeet: number, pricePerBoardFoot: number): number {
  if (!(boardFeet >= 0) || !(pricePerBoardFoot >= 0)) throw new RangeError('Board feet and price must be zero or more.');
  return boardFeet * pricePerBoardFoot;
}

/** A metric yard's price per m³ as a price per board foot (1 m³ ≈ 423.776 BF). */
export const pricePerBoardFootFromCubicMetre = (pricePerCubicMetre: number): number => pricePerCubicMetre / BOARD_FEET_PER_CUBIC_METRE;

import { BOARD_FEET_PER_CUBIC_METRE } from './board-feet';
import { requireNonNegative } from './require-positive';

/** What stock costs at a price per board foot. */
export function boardFootCost(boardFeet: number, pricePerBoardFoot: number): number {
  const cost = requireNonNegative('board feet', boardFeet) * requireNonNegative('price per board foot', pricePerBoardFoot);
  if (!Number.isFinite(cost)) throw new RangeError(`${boardFeet} BF at ${pricePerBoardFoot} a board foot is past any price: check the numbers.`);
  return cost;
}

/** A metric yard's price per m³ as a price per board foot (1 m³ ≈ 423.776 BF). */
export const pricePerBoardFootFromCubicMetre = (pricePerCubicMetre: number): number =>
  requireNonNegative('price per cubic metre', pricePerCubicMetre) / BOARD_FEET_PER_CUBIC_METRE;

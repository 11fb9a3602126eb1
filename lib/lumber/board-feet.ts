import type { Board } from '@/shared/schemas/lumber';
import { MM_PER_INCH } from '@/lib/units/length';
import { thicknessToMm } from './thickness';
import { MAX_LENGTH_MM, MIN_LENGTH_MM } from '@/lib/units/parse-length';
import { requireAtLeast, requireAtMost, requireNonNegative, requirePositive } from './require-positive';

/** One board foot is 144 in³ (12 × 12 × 1 in; AHEC "Measurement") = 2 359 737.216 mm³. */
export const MM3_PER_BOARD_FOOT = 144 * MM_PER_INCH ** 3;
const MM3_PER_CUBIC_METRE = 1e9;
/** ≈ 423.776 board feet to the cubic metre, derived from the two exact definitions above. */
export const BOARD_FEET_PER_CUBIC_METRE = MM3_PER_CUBIC_METRE / MM3_PER_BOARD_FOOT;

/** A board's width and length, each from 0.5 mm (below, a typing slip) to the 100 m past which a length is a slipped unit. */
export function boardSides({ width, length }: Pick<Board, 'width' | 'length'>): { width: number; length: number } {
  const side = (what: string, mm: number) =>
    requireAtMost(what, requireAtLeast(what, requirePositive(what, mm), MIN_LENGTH_MM, 'mm'), MAX_LENGTH_MM, 'mm');
  return { width: side('width', width), length: side('length', length) };
}

function volumeMm3(board: Board): number {
  if (!board || typeof board !== 'object') throw new RangeError('Give the board as { thickness, width, length }.');
  const { width, length } = boardSides(board);
  return thicknessToMm(board.thickness) * width * length;
}

/** Exact volume in board feet: T(in) × W(in) × L(ft) / 12, on the nominal thickness for quartered stock. */
export const boardFeet = (board: Board): number => volumeMm3(board) / MM3_PER_BOARD_FOOT;

/** Volume in m³, how metric shops buy and price solid wood. */
export const cubicMetres = (board: Board): number => volumeMm3(board) / MM3_PER_CUBIC_METRE;

/** Past a million board feet a number is a slipped unit (a large yard stocks a few hundred thousand). */
const MAX_BOARD_FEET = 1e9;

export const boardFeetToCubicMetres = (bf: number): number =>
  requireAtMost('board feet', requireNonNegative('board feet', bf), MAX_BOARD_FEET, 'BF') / BOARD_FEET_PER_CUBIC_METRE;
export const cubicMetresToBoardFeet = (m3: number): number =>
  requireAtMost('volume', requireNonNegative('volume', m3), MAX_BOARD_FEET / BOARD_FEET_PER_CUBIC_METRE, 'm³') * BOARD_FEET_PER_CUBIC_METRE;

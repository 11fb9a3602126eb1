import type { Board } from '@/shared/schemas/lumber';
import { MM_PER_INCH } from '@/lib/units/length';
import { thicknessMm } from './thickness';
import { requirePositive } from './require-positive';

/** One board foot is 144 in³ (12 × 12 × 1 in; AHEC "Measurement") = 2 359 737.216 mm³. */
export const MM3_PER_BOARD_FOOT = 144 * MM_PER_INCH ** 3;
const MM3_PER_CUBIC_METRE = 1e9;
/** ≈ 423.776 board feet to the cubic metre, derived from the two exact definitions above. */
export const BOARD_FEET_PER_CUBIC_METRE = MM3_PER_CUBIC_METRE / MM3_PER_BOARD_FOOT;

function volumeMm3({ thickness, widthMm, lengthMm }: Board): number {
  return requirePositive('thickness', thicknessMm(thickness)) * requirePositive('width', widthMm) * requirePositive('length', lengthMm);
}

/** Exact volume in board feet: T(in) × W(in) × L(ft) / 12, on the nominal thickness for quartered stock. */
export const boardFeet = (board: Board): number => volumeMm3(board) / MM3_PER_BOARD_FOOT;

/** Volume in m³, how metric shops buy and price solid wood. */
export const cubicMetres = (board: Board): number => volumeMm3(board) / MM3_PER_CUBIC_METRE;

export const boardFeetToCubicMetres = (bf: number): number => bf / BOARD_FEET_PER_CUBIC_METRE;
export const cubicMetresToBoardFeet = (m3: number): number => m3 * BOARD_FEET_PER_CUBIC_METRE;

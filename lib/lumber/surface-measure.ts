import type { Board } from '@/shared/schemas/lumber';
import { MM_PER_INCH } from '@/lib/units/length';
import { thicknessInches } from './thickness';
import { boardSides } from './board-feet';

export interface Tally {
  /** Width as measured, in inches (not rounded: the surface measure is). */
  widthIn: number;
  /** Length as tallied: rounded down to whole feet. */
  lengthFt: number;
  /** SM = W(in) × L(ft) / 12, rounded to the nearest whole foot, half up. */
  surfaceMeasure: number;
  /** BF = SM × nominal thickness (in). */
  boardFeet: number;
}

/** Drops float crumbs (2438.4 / 304.8 = 7.9999…) before rounding to whole inches or feet. */
const settle = (x: number) => Math.round(x * 1e6) / 1e6;

/**
 * The NHLA-style tally a hardwood yard invoices by (AHEC "Measurement"; see RULES.md): length rounded down to whole
 * feet, surface measure SM = measured width (in) × length (ft) / 12 rounded to the nearest whole foot (half up),
 * then times the nominal thickness. It differs from the exact volume (`boardFeet`): 2″ × 6¼″ × 8′ is SM 4.167 → 4,
 * tallied 8 BF against 8.33 exact. Halves round up here; a yard tallying a whole pile alternates them up and down.
 */
export function tally(board: Board): Tally {
  if (!board || typeof board !== 'object') throw new RangeError('Give the board as { thickness, width, length }.');
  const { width, length } = boardSides(board);
  const { thickness } = board;
  const widthIn = settle(width / MM_PER_INCH);
  const lengthFt = Math.floor(settle(length / (12 * MM_PER_INCH)));
  const surfaceMeasure = Math.floor(settle((widthIn * lengthFt) / 12) + 0.5);
  return { widthIn, lengthFt, surfaceMeasure, boardFeet: surfaceMeasure * thicknessInches(thickness) };
}

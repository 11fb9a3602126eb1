import type { Board } from '@/shared/schemas/lumber';
import { MM_PER_INCH } from '@/lib/units/length';
import { thicknessInches } from './thickness';
import { requirePositive } from './require-positive';

export interface Tally {
  /** Width as tallied: to the nearest inch. */
  widthIn: number;
  /** Length as tallied: rounded down to whole feet. */
  lengthFt: number;
  /** SM = W(in) × L(ft) / 12, rounded to a whole number. */
  surfaceMeasure: number;
  /** BF = SM × nominal thickness (in). */
  boardFeet: number;
}

/** Drops float crumbs (2438.4 / 304.8 = 7.9999…) before rounding to whole inches or feet. */
const settle = (x: number) => Math.round(x * 1e6) / 1e6;

/**
 * The NHLA-style tally a hardwood yard invoices by (AHEC "Measurement"; see RULES.md): width to the
 * nearest inch, length rounded down to whole feet, surface measure rounded to a whole number, then times
 * the nominal thickness. It differs from the exact volume (`boardFeet`): 2″ × 6¼″ × 8′ tallies 8 BF
 * against 8.33 exact. Halves round up here; a yard tallying a whole pile alternates them up and down.
 */
export function tally({ thickness, widthMm, lengthMm }: Board): Tally {
  const widthIn = Math.round(settle(requirePositive('width', widthMm) / MM_PER_INCH));
  const lengthFt = Math.floor(settle(requirePositive('length', lengthMm) / (12 * MM_PER_INCH)));
  const surfaceMeasure = Math.round((widthIn * lengthFt) / 12);
  return { widthIn, lengthFt, surfaceMeasure, boardFeet: surfaceMeasure * thicknessInches(thickness) };
}

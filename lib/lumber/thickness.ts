import type { Thickness } from '@/shared/schemas/lumber';
import { type Mm, MM_PER_INCH } from '@/lib/units/length';

import { MIN_LENGTH_MM } from '@/lib/units/parse-length';
import { requireAtLeast, requireAtMost, requirePositive } from './require-positive';

/** Past a metre a thickness is a slipped unit (the thickest quarters, 48/4, are 12″). */
export const MAX_BOARD_THICKNESS_MM = 1000;

/** Rough lumber comes in whole quarters of an inch, 1/4 to 48/4 (AHEC; hardwood trade practice). */
function checked(t: Thickness): Thickness {
  if (!t || typeof t !== 'object') throw new RangeError('Give the thickness as { quarters } (5 for 5/4) or { mm }.');
  if ('quarters' in t) {
    if (!Number.isInteger(t.quarters) || t.quarters < 1 || t.quarters > 48)
      throw new RangeError(`Quarters are whole numbers from 1 to 48, as 5 for 5/4 (got ${t.quarters}).`);
    return t;
  }
  requireAtMost('thickness', requireAtLeast('thickness', requirePositive('thickness', t.mm), MIN_LENGTH_MM, 'mm'), MAX_BOARD_THICKNESS_MM, 'mm');
  return t;
}

/** Nominal thickness in inches: n/4 is n quarters of an inch (AHEC; hardwood trade practice). */
export const thicknessInches = (t: Thickness): number => {
  const c = checked(t);
  return 'quarters' in c ? c.quarters / 4 : c.mm / MM_PER_INCH;
};

export const thicknessToMm = (t: Thickness): Mm => {
  const c = checked(t);
  return 'quarters' in c ? (c.quarters / 4) * MM_PER_INCH : c.mm;
};

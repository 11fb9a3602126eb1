import type { Thickness } from '@/shared/schemas/lumber';
import { type Mm, MM_PER_INCH } from '@/lib/units/length';

/** Nominal thickness in inches: n/4 is n quarters of an inch (AHEC; hardwood trade practice). */
export const thicknessInches = (t: Thickness): number => ('quarters' in t ? t.quarters / 4 : t.mm / MM_PER_INCH);

export const thicknessMm = (t: Thickness): Mm => ('quarters' in t ? (t.quarters / 4) * MM_PER_INCH : t.mm);

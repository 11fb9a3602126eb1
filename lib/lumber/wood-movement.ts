import type { MovementInput, SawnCut } from '@/shared/schemas/lumber';
import type { ShopUnits } from '@/shared/schemas/units';
import { formatLength } from '@/lib/units/format-length';
import { inches, type Mm, MM_PER_INCH } from '@/lib/units/length';
import { SPECIES, type SpeciesId } from './species';
import { requirePositive } from './require-positive';

/** The Wood Handbook's shrinkage equation (13-2) holds between these moisture contents (percent). */
export const MOVEMENT_VALID_MC = { min: 6, max: 14 } as const;

/**
 * A panel fixed across its width that must move more than this cracks, bows or pulls its joints apart;
 * 1/16″ (≈ 1.6 mm) is where that starts to show (common practice, no source). An editable default.
 */
export const MOVEMENT_WARNING_THRESHOLD_MM: Mm = inches(1 / 16);

export interface DimensionalChange {
  /** Positive when the board swells, negative when it shrinks. */
  changeMm: Mm;
  /** Shrinkage coefficient used: per 1 % moisture content. */
  coefficient: number;
  /** False when either moisture content is outside 6–14 %, where the result is only an estimate. */
  withinValidRange: boolean;
}

/** ΔW = W × C × (MC_to − MC_from), USDA FPL Wood Handbook (FPL-GTR-190, 2010), ch. 13, eq. 13-2. */
export function dimensionalChange({ species, widthMm, cut, mcFrom, mcTo }: { species: SpeciesId; widthMm: Mm; cut: SawnCut; mcFrom: number; mcTo: number }): DimensionalChange {
  const s = SPECIES[species];
  if (!s) throw new RangeError(`Unknown species "${species}".`);
  const coefficient = cut === 'quartersawn' ? s.radial : s.tangential;
  const inRange = (mc: number) => mc >= MOVEMENT_VALID_MC.min && mc <= MOVEMENT_VALID_MC.max;
  return {
    changeMm: requirePositive('width', widthMm) * coefficient * (mcTo - mcFrom),
    coefficient,
    withinValidRange: inRange(mcFrom) && inRange(mcTo),
  };
}

const DEFAULT_UNITS: ShopUnits = { system: 'imperial', precision: 16, feet: false };

/**
 * A warning for a solid-wood bottom or panel fixed across its width that will move more than
 * `thresholdMm` between the two moisture contents; null when it may move freely or moves too little to matter.
 */
export function movementWarning(input: MovementInput, units: ShopUnits = DEFAULT_UNITS): string | null {
  const { species, widthMm, cut, mcFrom, mcTo, fixedAcrossWidth, thresholdMm = MOVEMENT_WARNING_THRESHOLD_MM } = input;
  if (!fixedAcrossWidth) return null;
  const { changeMm, withinValidRange } = dimensionalChange({ species, widthMm, cut, mcFrom, mcTo });
  const amount = Math.abs(changeMm);
  if (amount <= thresholdMm) return null;

  const moved =
    units.system === 'metric' ? `${amount.toFixed(1)} mm` : `${(amount / MM_PER_INCH).toFixed(3)}″ (${amount.toFixed(1)} mm)`;
  const remedy = cut === 'flatsawn' ? 'let it float in a groove or on slotted holes, or use quartersawn stock or plywood' : 'let it float in a groove or on slotted holes, or use plywood';
  const caveat = withinValidRange
    ? ''
    : ` This is only an estimate: the handbook's coefficients hold between ${MOVEMENT_VALID_MC.min} % and ${MOVEMENT_VALID_MC.max} % moisture content.`;
  return (
    `A ${formatLength(widthMm, units)} wide ${cut} ${SPECIES[species].name} panel fixed across its width will ` +
    `${changeMm > 0 ? 'swell' : 'shrink'} about ${moved} going from ${mcFrom} % to ${mcTo} % moisture content — more than the ` +
    `${formatLength(thresholdMm, units)} it can take without cracking or bowing: ${remedy}.${caveat}`
  );
}

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
  change: Mm;
  /** Shrinkage coefficient used: per 1 % moisture content. */
  coefficient: number;
  /** False when either moisture content is outside 6–14 %, where the result is only an estimate. */
  withinValidRange: boolean;
}

/** Moisture contents a board can have and still move: 0 % to about 30 % (fibre saturation; FPL-GTR-190 ch. 13). */
export const MOISTURE_LIMITS = { min: 0, max: 30 } as const;

/** The widest panel movement is figured for: 3 m (a slipped unit beyond that). */
const MAX_PANEL_WIDTH_MM = 3000;

/** Which coefficient a cut moves by across its width: the radial one for quarter- and riftsawn, tangential for flatsawn. */
export const COEFFICIENT_FOR_CUT: Record<SawnCut, 'radial' | 'tangential'> = { flatsawn: 'tangential', quartersawn: 'radial', riftsawn: 'radial' };

function moisture(what: string, mc: number): number {
  if (!Number.isFinite(mc) || mc < MOISTURE_LIMITS.min || mc > MOISTURE_LIMITS.max) {
    throw new RangeError(`The ${what} moisture content must be between ${MOISTURE_LIMITS.min} % and ${MOISTURE_LIMITS.max} % (got ${mc}).`);
  }
  return mc;
}

/** ΔW = W × C × (MC_to − MC_from), USDA FPL Wood Handbook (FPL-GTR-190, 2010), ch. 13, eq. 13-2. */
export function dimensionalChange({
  species,
  width: givenWidth,
  cut,
  mcFrom,
  mcTo,
}: {
  species: SpeciesId;
  width: Mm;
  cut: SawnCut;
  mcFrom: number;
  mcTo: number;
}): DimensionalChange & { basis: 'radial' | 'tangential' } {
  if (!Object.hasOwn(SPECIES, species)) throw new RangeError(`Unknown species "${species}": use one of ${Object.keys(SPECIES).join(', ')}.`);
  if (!Object.hasOwn(COEFFICIENT_FOR_CUT, cut)) throw new RangeError(`Unknown cut "${cut}": use flatsawn, quartersawn or riftsawn.`);
  const width = requirePositive('width', givenWidth);
  if (width > MAX_PANEL_WIDTH_MM) throw new RangeError(`A panel ${width} mm wide is past ${MAX_PANEL_WIDTH_MM} mm: check the unit.`);
  const s = SPECIES[species];
  const basis = COEFFICIENT_FOR_CUT[cut];
  const coefficient = s[basis];
  const inRange = (mc: number) => mc >= MOVEMENT_VALID_MC.min && mc <= MOVEMENT_VALID_MC.max;
  const from = moisture('starting', mcFrom);
  const to = moisture('final', mcTo);
  return { change: width * coefficient * (to - from), coefficient, basis, withinValidRange: inRange(from) && inRange(to) };
}

const DEFAULT_UNITS: ShopUnits = { system: 'imperial', precision: 16, feet: false };

/**
 * A warning for a solid-wood bottom or panel fixed across its width that will move more than
 * `threshold` between the two moisture contents; null when it may move freely or moves too little to matter.
 */
export function movementWarning(input: MovementInput, units: ShopUnits = DEFAULT_UNITS): string | null {
  const { species, width, cut, mcFrom, mcTo, fixedAcrossWidth, threshold = MOVEMENT_WARNING_THRESHOLD_MM } = input;
  if (!fixedAcrossWidth) return null;
  const { change, withinValidRange, basis } = dimensionalChange({ species, width, cut, mcFrom, mcTo });
  requirePositive('threshold', threshold);
  const amount = Math.abs(change);
  if (amount <= threshold) return null;

  const moved = units.system === 'metric' ? `${amount.toFixed(1)} mm` : `${(amount / MM_PER_INCH).toFixed(3)}″ (${amount.toFixed(1)} mm)`;
  const remedy =
    cut === 'flatsawn'
      ? 'let it float in a groove or on slotted holes, or use quartersawn stock or plywood'
      : 'let it float in a groove or on slotted holes, or use plywood';
  const caveat =
    (withinValidRange
      ? ''
      : ` This is only an estimate: the handbook's coefficients hold between ${MOVEMENT_VALID_MC.min} % and ${MOVEMENT_VALID_MC.max} % moisture content.`) +
    (cut === 'riftsawn' ? ` Figured with the ${basis} (quartersawn) coefficient: rift moves a little more.` : '');
  return (
    `A ${formatLength(width, units)} wide ${cut} ${SPECIES[species].name} panel fixed across its width will ` +
    `${change > 0 ? 'swell' : 'shrink'} about ${moved} going from ${mcFrom} % to ${mcTo} % moisture content — more than the ` +
    `${formatLength(threshold, units)} it can take without cracking or bowing: ${remedy}.${caveat}`
  );
}

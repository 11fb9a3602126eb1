/**
 * Kerfwise's canonical length unit is the millimetre, as a plain number.
 * Every length stored, computed or sent between server, client and worker is in mm;
 * conversion to the shop's unit happens only when parsing input and formatting output.
 */
export type Mm = number;

/** Exactly 25.4 mm to the inch (NIST SP 811; 1959 international yard and pound agreement). */
export const MM_PER_INCH = 25.4;

/** Refuses NaN and ±Infinity: a length computed from one would be silently wrong everywhere it went. */
export function requireFinite(what: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw new RangeError(`${what} must be a finite number (got ${String(value)}).`);
  return value;
}

/** Past a million kilometres a number is no length at all (and its conversion overflows). */
const MAX_CONVERTED_MM = 1e12;

function sane(what: string, value: number, mm: Mm): Mm {
  requireFinite(what, value);
  if (Math.abs(mm) > MAX_CONVERTED_MM) throw new RangeError(`${what} of ${value} is past a million km: not a length.`);
  return mm;
}

/** Inches to mm; negative inches are allowed (a difference, a shrinkage). */
export const inches = (n: number): Mm => sane('A length in inches', n, n * MM_PER_INCH);
export const toInches = (mm: Mm): number => sane('A length in mm', mm, mm) / MM_PER_INCH;

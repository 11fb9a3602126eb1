/** Domain functions trust their zod-checked inputs but still refuse nonsense rather than return it. */
export function requirePositive(what: string, value: number): number {
  if (typeof value !== 'number' || !(value > 0) || !Number.isFinite(value))
    throw new RangeError(`The ${what} must be a positive number (got ${String(value)}).`);
  return value;
}

/** Zero or more, and finite: a quantity, a price, a volume. */
export function requireNonNegative(what: string, value: number): number {
  if (typeof value !== 'number' || !(value >= 0) || !Number.isFinite(value))
    throw new RangeError(`The ${what} must be zero or more (got ${String(value)}).`);
  return value;
}

/** At least `min`: under it a size is a typing slip (and its arithmetic underflows). */
export function requireAtLeast(what: string, value: number, min: number, unit: string): number {
  if (value < min) throw new RangeError(`The ${what} (${value} ${unit}) is under ${min} ${unit}: a typing slip?`);
  return value;
}

/** At most `max`: past it a number is a slipped unit, not a board. */
export function requireAtMost(what: string, value: number, max: number, unit: string): number {
  if (value > max) throw new RangeError(`The ${what} (${value} ${unit}) is past ${max} ${unit}: check the unit.`);
  return value;
}

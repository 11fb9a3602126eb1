/** Domain functions trust their zod-checked inputs but still refuse nonsense rather than return it. */
export function requirePositive(what: string, value: number): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`The ${what} must be a positive number (got ${value}).`);
  return value;
}

/**
 * Below this fraction of a step a value counts as already on the grid: float arithmetic leaves
 * crumbs like 19.749999999999996 that must not earn a "≈" mark.
 */
export const ON_GRID_TOLERANCE = 1e-9;

export interface Rounded {
  value: number;
  /** True when no rounding happened (the value was already a whole number of steps). */
  exact: boolean;
}

/**
 * Rounds to the nearest whole number of `step`, half away from zero, and says whether that changed
 * anything — the formatters use `exact` to decide whether a number may be shown without "≈".
 */
export function roundToPrecision(value: number, step: number): Rounded {
  if (!(step > 0) || !Number.isFinite(step)) throw new RangeError(`The rounding step must be a positive number (got ${step}).`);
  if (!Number.isFinite(value)) throw new RangeError(`Cannot round ${value}.`);
  // Beyond 2⁵³ steps the count itself is no longer exact (and a subnormal step overflows it to Infinity).
  if (Math.abs(value) / step > Number.MAX_SAFE_INTEGER) throw new RangeError(`A step of ${step} is too fine to round ${value} to.`);
  const steps = Math.sign(value) * Math.round(Math.abs(value) / step);
  const rounded = steps * step;
  return { value: rounded === 0 ? 0 : rounded, exact: Math.abs(value - rounded) <= step * ON_GRID_TOLERANCE };
}

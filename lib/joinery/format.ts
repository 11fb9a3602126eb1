import type { Mm } from '@/lib/units/length';

export type LengthText = (mm: Mm) => string;

// To 0.1 mm, half up, after dropping float crumbs (31.75 is carried as 31.749999…, and must read 31.8).
const millimetres: LengthText = (mm) => `${Math.round(Number((mm * 10).toPrecision(12))) / 10} mm`;
// Exact to 0.01 mm: a slide's 12.5 mm clearance must not read 13.
const exactMillimetres: LengthText = (mm) => `${Math.round(Number((mm * 100).toPrecision(12))) / 100} mm`;
let current: LengthText = millimetres;
let currentExact: LengthText = exactMillimetres;

/**
 * Runs `body` with lengths in notes and messages written by `lengthText` (the shop's unit, from the caller), and the
 * figures of a rule (a clearance, a deduction, a slide's lengths) by `exactText`, which must not round them away.
 * Sizing is synchronous, so the writers cannot leak into another call.
 */
export function withLengthText<T>(lengthText: LengthText | undefined, body: () => T, exactText?: LengthText): T {
  const previous = [current, currentExact] as const;
  current = lengthText ?? millimetres;
  currentExact = exactText ?? lengthText ?? exactMillimetres;
  try {
    return body();
  } finally {
    [current, currentExact] = previous;
  }
}

/** Lengths inside machining notes and messages; plain mm unless the caller of the sizing named the shop's unit. */
export const mmText = (mm: Mm): string => current(printable(mm));

/** A rule's own figure (12.5 mm a side, 1-5/8″ off the opening), written exactly. */
export const specText = (mm: Mm): string => currentExact(printable(mm));

/** A message never says "NaN mm": a length that is not finite is a bug to stop, not a number to print. */
function printable(mm: Mm): Mm {
  if (typeof mm !== 'number' || !Number.isFinite(mm)) throw new RangeError(`A drawer note was about to print ${String(mm)} as a length.`);
  return mm;
}

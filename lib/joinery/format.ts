import type { Mm } from '@/lib/units/length';

export type LengthText = (mm: Mm) => string;

// To 0.1 mm, half up, after dropping float crumbs (31.75 is carried as 31.749999…, and must read 31.8).
const millimetres: LengthText = (mm) => `${Math.round(Number((mm * 10).toPrecision(12))) / 10} mm`;
let current: LengthText = millimetres;

/**
 * Runs `body` with lengths in notes and messages written by `lengthText` (the shop's unit, from the caller).
 * Sizing is synchronous, so the writer cannot leak into another call.
 */
export function withLengthText<T>(lengthText: LengthText | undefined, body: () => T): T {
  const previous = current;
  current = lengthText ?? millimetres;
  try {
    return body();
  } finally {
    current = previous;
  }
}

/** Lengths inside machining notes and messages; plain mm unless the caller of the sizing named the shop's unit. */
export const mmText = (mm: Mm): string => current(mm);

import type { Mm } from '@/lib/units/length';

/** Lengths inside machining notes and messages; the UI formats the structured numbers in the shop's unit. */
export const mmText = (mm: Mm): string => `${Math.round(mm * 10) / 10} mm`;

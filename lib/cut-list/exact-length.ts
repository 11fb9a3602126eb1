import { formatLength, type LengthStyle } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';

/**
 * A length as text that reads back to the same value: the shop's unit when it shows the value exactly, else 1/32″
 * for an imperial shop (23/32″ plywood), else millimetres to 0.01 — never a rounded "≈" value someone could
 * type back in or cut to.
 */
export function exactLengthText(mm: number, units: ShopUnits, style: LengthStyle = 'hyphen'): string {
  const approx = (s: string) => s.startsWith('≈') || s.startsWith('~');
  const shown = formatLength(mm, units, { style });
  if (!approx(shown)) return shown;
  if (units.system === 'imperial' && units.precision !== 32) {
    const finer = formatLength(mm, { ...units, precision: 32 }, { style });
    if (!approx(finer)) return finer;
  }
  return `${Math.round(mm * 100) / 100} mm`;
}

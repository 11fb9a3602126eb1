import type { ShopUnits } from '@/shared/schemas/units';
import { MM_PER_INCH } from './length';
import { roundToPrecision } from './round-to-precision';
import { checkShopUnits } from './shop-units-check';

const MM2_PER_M2 = 1_000_000;
const MM2_PER_FT2 = (12 * MM_PER_INCH) ** 2; // 92 903.04 mm², exact from the 25.4 mm inch
const AREA_CRUMB_MM2 = 1e-6;
/** A million km²: far past every stock room and ledger, short of where numbers print in exponents. */
export const MAX_SHOWN_AREA_MM2 = 1e18;

/**
 * An area (mm²) in m² for metric shops and ft² for imperial ones, to `decimals` places (trailing zeros
 * dropped: a 4×8 sheet is "32 ft²"), marked "≈" when rounded.
 */
export function formatArea(mm2: number, units: ShopUnits, { decimals = 2 }: { decimals?: number } = {}): string {
  if (typeof mm2 !== 'number' || !Number.isFinite(mm2)) throw new RangeError(`Cannot show ${String(mm2)} as an area.`);
  // An area is never negative; float crumbs of a difference (−1e-9 mm²) are nought.
  if (mm2 < -AREA_CRUMB_MM2) throw new RangeError(`An area cannot be negative (got ${mm2} mm²).`);
  if (mm2 > MAX_SHOWN_AREA_MM2) throw new RangeError(`${mm2} mm² is past a million km²: not an area to show (a slipped unit?).`);
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 6) throw new RangeError(`Decimals are a whole number from 0 to 6 (got ${decimals}).`);
  const metric = checkShopUnits(units).system === 'metric';
  const { value, exact } = roundToPrecision(Math.max(0, mm2) / (metric ? MM2_PER_M2 : MM2_PER_FT2), 10 ** -decimals);
  return `${exact ? '' : '≈'}${Number(value.toFixed(decimals))} ${metric ? 'm²' : 'ft²'}`;
}

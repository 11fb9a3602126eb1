import type { ShopUnits } from '@/shared/schemas/units';
import { MM_PER_INCH } from './length';
import { roundToPrecision } from './round-to-precision';

const MM2_PER_M2 = 1_000_000;
const MM2_PER_FT2 = (12 * MM_PER_INCH) ** 2; // 92 903.04 mm², exact from the 25.4 mm inch

/**
 * An area (mm²) in m² for metric shops and ft² for imperial ones, to `decimals` places (trailing zeros
 * dropped: a 4×8 sheet is "32 ft²"), marked "≈" when rounded.
 */
export function formatArea(mm2: number, units: ShopUnits, { decimals = 2 }: { decimals?: number } = {}): string {
  const metric = units.system === 'metric';
  const { value, exact } = roundToPrecision(mm2 / (metric ? MM2_PER_M2 : MM2_PER_FT2), 10 ** -decimals);
  return `${exact ? '' : '≈'}${Number(value.toFixed(decimals))} ${metric ? 'm²' : 'ft²'}`;
}

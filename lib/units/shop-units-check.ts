import type { ShopUnits } from '@/shared/schemas/units';

/**
 * Refuses a unit setting the formatters cannot honour (a precision of 0 would print NaN), with what is allowed.
 * The settings are zod-checked where they enter; this keeps a wrong object from becoming a wrong number.
 */
export function checkShopUnits(units: ShopUnits): ShopUnits {
  const ok =
    units &&
    ((units.system === 'imperial' && (units.precision === 16 || units.precision === 32)) ||
      (units.system === 'metric' && (units.precision === 0.5 || units.precision === 1)));
  if (!ok) throw new RangeError(`Unknown unit setting ${JSON.stringify(units)}: imperial to 1/16 or 1/32″, or metric to 0.5 or 1 mm.`);
  return units;
}

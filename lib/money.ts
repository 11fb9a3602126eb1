import { formatMoney as formatMinor } from '@/lib/costing/money';

/**
 * Money is kept in minor units (cents) as integers; shown in the shop's currency with its own decimals (USD 2, JPY 0,
 * KWD 3: lib/costing/money.ts). A fraction of a minor unit (an area share of a sheet's cost) shows rounded half up.
 */
export function formatMoney(cents: number, currency: string, locale = 'en-US'): string {
  return formatMinor(Math.round(cents), currency, locale);
}

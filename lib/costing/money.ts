/**
 * Money in Kerfwise is an integer count of the currency's minor unit (cents for USD, yen for JPY, fils for KWD). How
 * many decimals a currency has comes from Intl.NumberFormat's resolved options, so a currency without cents works.
 * Every function refuses NaN, ±Infinity and absurd amounts with a RangeError that says why (see RULES.md).
 */

/** The largest amount a quote handles: a thousand million major units (ten figures) — past it, a slipped digit. */
export const MAX_MAJOR_UNITS = 1_000_000_000;

const digitsCache = new Map<string, number>();

/** Decimals of a currency (USD 2, JPY 0, KWD 3), from Intl.NumberFormat; an unknown code is a RangeError. */
export function currencyDigits(currency: string): number {
  if (typeof currency !== 'string' || !/^[A-Za-z]{3}$/.test(currency))
    throw new RangeError(`A currency is a three-letter ISO 4217 code such as USD; got ${JSON.stringify(String(currency)).slice(0, 20)}.`);
  const code = currency.toUpperCase();
  const known = digitsCache.get(code);
  if (known !== undefined) return known;
  const digits = new Intl.NumberFormat('en-US', { style: 'currency', currency: code }).resolvedOptions().maximumFractionDigits ?? 2;
  digitsCache.set(code, digits);
  return digits;
}

/** Minor units in one major unit: 100 for USD, 1 for JPY, 1000 for KWD. */
export const minorPerMajor = (currency: string) => 10 ** currencyDigits(currency);

/** The most minor units any amount may have in this currency. */
export const maxMinor = (currency: string) => MAX_MAJOR_UNITS * minorPerMajor(currency);

/** Checks an amount in minor units: a whole number, not negative unless allowed, at most MAX_MAJOR_UNITS major units. */
export function assertMinor(value: number, what: string, currency: string, { negative = false } = {}): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw new RangeError(`${what} must be a finite amount; got ${String(value)}.`);
  if (!Number.isInteger(value)) throw new RangeError(`${what} is counted in whole minor units (cents); got ${value}.`);
  if (value < 0 && !negative) throw new RangeError(`${what} cannot be negative; got ${value}.`);
  if (Math.abs(value) > maxMinor(currency))
    throw new RangeError(`${what} is over ${MAX_MAJOR_UNITS.toLocaleString('en-US')} ${currency.toUpperCase()}: that looks like a slipped digit.`);
  return value;
}

/**
 * Integer division rounded half up (away from zero for the non-negative values money takes here): the one rounding
 * step of RULES.md. Exact for numerators up to 2⁵³.
 */
export function divideRounded(numerator: number, denominator: number): number {
  if (!Number.isSafeInteger(numerator) || !Number.isSafeInteger(denominator) || denominator <= 0) {
    throw new RangeError(`Rounding needs whole numbers under 2^53 and a positive divisor; got ${String(numerator)} / ${String(denominator)}.`);
  }
  const sign = numerator < 0 ? -1 : 1;
  const n = Math.abs(numerator);
  const q = Math.floor(n / denominator);
  const r = n - q * denominator;
  return sign * (2 * r >= denominator ? q + 1 : q);
}

/**
 * A decimal with at most `places` decimals as a whole number of its smallest step (2.5 with places 2 → 250). More
 * decimals than that are refused rather than rounded silently (a typed 33.333 % is not 33.33 %).
 */
export function toSteps(value: number, places: number, what: string, { max, integerOnly = false }: { max: number; integerOnly?: boolean }): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw new RangeError(`${what} must be a finite number; got ${String(value)}.`);
  if (value < 0) throw new RangeError(`${what} cannot be negative; got ${value}.`);
  if (value > max) throw new RangeError(`${what} of ${value} is over ${max.toLocaleString('en-US')}: that looks like a slip.`);
  if (integerOnly && !Number.isInteger(value)) throw new RangeError(`${what} is a whole number; got ${value}.`);
  const scale = 10 ** places;
  const steps = Math.round(value * scale);
  if (Math.abs(steps - value * scale) > 1e-6 * Math.max(1, steps)) throw new RangeError(`${what} takes at most ${places} decimals; got ${value}.`);
  return steps;
}

/** A typed amount in major units (19.99) → minor units (1999); more decimals than the currency has are refused. */
export function toMinorUnits(major: number, currency: string): number {
  const digits = currencyDigits(currency);
  return toSteps(major, digits, 'An amount', { max: MAX_MAJOR_UNITS });
}

/** Minor units shown in the shop's currency: formatMoney(197500, 'USD') → "$1,975.00"; JPY 1975 → "¥1,975". */
export function formatMoney(minor: number, currency: string, locale = 'en-US'): string {
  assertMinor(minor, 'An amount', currency, { negative: true });
  const digits = currencyDigits(currency);
  return new Intl.NumberFormat(locale, {
    style: 'currency',
    currency: currency.toUpperCase(),
    minimumFractionDigits: digits,
    maximumFractionDigits: digits,
  }).format(minor / 10 ** digits);
}

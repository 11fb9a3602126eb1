/** Unicode's single-character fractions (Latin-1 and Number Forms), as [numerator, denominator]. */
export const VULGAR_FRACTIONS: Readonly<Record<string, readonly [number, number]>> = {
  '¼': [1, 4],
  '½': [1, 2],
  '¾': [3, 4],
  '⅐': [1, 7],
  '⅑': [1, 9],
  '⅒': [1, 10],
  '⅓': [1, 3],
  '⅔': [2, 3],
  '⅕': [1, 5],
  '⅖': [2, 5],
  '⅗': [3, 5],
  '⅘': [4, 5],
  '⅙': [1, 6],
  '⅚': [5, 6],
  '⅛': [1, 8],
  '⅜': [3, 8],
  '⅝': [5, 8],
  '⅞': [7, 8],
};

export const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
export const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';
/** U+2044, the slash typographers use between a superscript numerator and a subscript denominator. */
export const FRACTION_SLASH = '⁄';

const glyphFor = new Map(Object.entries(VULGAR_FRACTIONS).map(([glyph, [n, d]]) => [`${n}/${d}`, glyph]));

/**
 * A proper fraction set as one glyph (¾) where Unicode has one, otherwise as ³⁄₁₆ — sixteenths and
 * thirty-seconds have no single character.
 */
export function typesetFraction(numerator: number, denominator: number): string {
  if (!Number.isSafeInteger(numerator) || !Number.isSafeInteger(denominator) || numerator < 0 || denominator < 1)
    throw new RangeError(`A fraction to typeset needs a whole numerator from 0 and a whole denominator from 1 (got ${numerator}/${denominator}).`);
  const glyph = glyphFor.get(`${numerator}/${denominator}`);
  if (glyph) return glyph;
  const sup = [...String(numerator)].map((c) => SUPERSCRIPT_DIGITS[Number(c)]).join('');
  const sub = [...String(denominator)].map((c) => SUBSCRIPT_DIGITS[Number(c)]).join('');
  return `${sup}${FRACTION_SLASH}${sub}`;
}

/** Greatest common divisor of two whole numbers (of either sign). */
export function gcd(a: number, b: number): number {
  if (!Number.isSafeInteger(a) || !Number.isSafeInteger(b))
    throw new RangeError(`The greatest common divisor is of whole numbers (got ${a} and ${b}).`);
  let x = Math.abs(a);
  let y = Math.abs(b);
  while (y) [x, y] = [y, x % y];
  return x;
}

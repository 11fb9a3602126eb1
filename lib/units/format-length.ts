import type { ShopUnits } from '@/shared/schemas/units';
import { type Mm, MM_PER_INCH } from './length';
import { gcd, typesetFraction } from './fraction-glyphs';
import { roundToPrecision } from './round-to-precision';
import { checkShopUnits } from './shop-units-check';

/** Past this a length is not one a shop shows (a slipped unit or a broken sum): 1,000 km. */
export const MAX_SHOWN_LENGTH_MM = 1e9;

/**
 * `hyphen`: 19-3/4″ (the default, reads on any screen); `unicode`: 19¾″ and 3⁄16 as raised/lowered
 * digits; `ascii`: 19-3/4" with plain quotes and `~` for ≈, for CSV files and label printers.
 */
export type LengthStyle = 'hyphen' | 'unicode' | 'ascii';

/** The smallest step a shop's lengths are shown in, in mm. */
export const precisionStepMm = (units: ShopUnits): Mm =>
  checkShopUnits(units).system === 'imperial' ? MM_PER_INCH / units.precision : units.precision;

/**
 * Shows a length in the shop's unit and precision. A rounded value is marked "≈" so nobody saws to a
 * number that isn't the real one; a value already on the shop's grid is shown bare.
 */
export function formatLength(mm: Mm, units: ShopUnits, { style = 'hyphen' }: { style?: LengthStyle } = {}): string {
  if (typeof mm !== 'number' || !Number.isFinite(mm)) throw new RangeError(`Cannot show ${String(mm)} as a length.`);
  if (Math.abs(mm) > MAX_SHOWN_LENGTH_MM)
    throw new RangeError(`${mm} mm is past ${MAX_SHOWN_LENGTH_MM / 1e6} km: not a length to show (a slipped unit?).`);
  checkShopUnits(units);
  if (style !== 'hyphen' && style !== 'unicode' && style !== 'ascii')
    throw new RangeError(`Unknown length style "${String(style)}": hyphen, unicode or ascii.`);
  const ascii = style === 'ascii';
  if (units.system === 'metric') {
    const { value, exact } = roundToPrecision(mm, units.precision);
    return `${exact ? '' : ascii ? '~' : '≈'}${sign(value, ascii)}${Math.abs(value)} mm`;
  }

  const denominator = units.precision;
  const { value, exact } = roundToPrecision(mm / MM_PER_INCH, 1 / denominator);
  const count = Math.round(Math.abs(value) * denominator); // whole 1/denominator-inch steps
  const inchMark = ascii ? '"' : '″';
  const footMark = ascii ? "'" : '′';

  const stepsPerFoot = 12 * denominator;
  const feet = units.feet ? Math.floor(count / stepsPerFoot) : 0;
  const rest = count - feet * stepsPerFoot;
  let text: string;
  if (feet > 0) text = rest === 0 ? `${feet}${footMark}` : `${feet}${footMark} ${inchesText(rest, denominator, style)}${inchMark}`;
  else text = `${inchesText(rest, denominator, style)}${inchMark}`;
  return `${exact ? '' : ascii ? '~' : '≈'}${sign(value, ascii)}${text}`;
}

const sign = (value: number, ascii: boolean) => (value < 0 ? (ascii ? '-' : '−') : '');

/** `steps` of 1/denominator inch as whole inches and a fraction in lowest terms. */
function inchesText(steps: number, denominator: number, style: LengthStyle): string {
  const whole = Math.floor(steps / denominator);
  const remainder = steps % denominator;
  if (remainder === 0) return String(whole);
  const common = gcd(remainder, denominator);
  const [n, d] = [remainder / common, denominator / common];
  if (style === 'unicode') return `${whole || ''}${typesetFraction(n, d)}`;
  return whole ? `${whole}-${n}/${d}` : `${n}/${d}`;
}

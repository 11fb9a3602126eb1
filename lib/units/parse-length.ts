import { MM_PER_INCH, type Mm } from './length';
import { FRACTION_SLASH, SUBSCRIPT_DIGITS, SUPERSCRIPT_DIGITS, VULGAR_FRACTIONS } from './fraction-glyphs';

/** The unit a bare number is read in: the shop's own. */
export type LengthUnit = 'in' | 'mm';

export type ParsedLength = { ok: true; mm: Mm } | { ok: false; error: string; /** 1-based character */ position?: number };

/** No part, board or sheet is longer; a bigger number almost always means a slipped unit (mm typed as m). */
export const MAX_LENGTH_MM = 100_000;

/** Nothing a shop cuts or sets is thinner: below half a millimetre is a typing slip (common practice, no source). */
export const MIN_LENGTH_MM = 0.5;

type Unit = 'in' | 'ft' | 'mm' | 'cm' | 'm';

/** mm per unit as a fraction [numerator, denominator], so conversion stays exact until the last division. */
const MM_PER: Record<Unit, readonly [number, number]> = {
  in: [254, 10], // 25.4 mm exactly (NIST SP 811)
  ft: [3048, 10],
  mm: [1, 1],
  cm: [10, 1],
  m: [1000, 1],
};

const UNIT_WORDS: Record<string, Unit> = {
  in: 'in',
  inch: 'in',
  inches: 'in',
  ft: 'ft',
  foot: 'ft',
  feet: 'ft',
  mm: 'mm',
  millimetre: 'mm',
  millimetres: 'mm',
  millimeter: 'mm',
  millimeters: 'mm',
  cm: 'cm',
  centimetre: 'cm',
  centimetres: 'cm',
  centimeter: 'cm',
  centimeters: 'cm',
  m: 'm',
  metre: 'm',
  metres: 'm',
  meter: 'm',
  meters: 'm',
};

const UNIT_HINT = 'in, ″, ft, ′, mm, cm or m';
const FOOT_MARKS = new Set(["'", '′', '’']);
const INCH_MARKS = new Set(['"', '″', '”', '“']);
const DASHES = new Set(['-', '‐', '‑', '–', '−']);
const SLASHES = new Set(['/', FRACTION_SLASH, '∕']);
const APPROX_MARKS = new Set(['≈', '~']);

/** A rational number n/d; lengths stay exact (19-3/4″ is 79/4) until converted to mm. */
interface Ratio {
  n: number;
  d: number;
}

type Token = { start: number; end: number } & (
  | { kind: 'number'; value: Ratio; whole: boolean; thousandsDot: boolean }
  | { kind: 'glyph-fraction'; value: Ratio }
  | { kind: 'slash' | 'dash' | 'approx' }
  | { kind: 'unit'; unit: Unit }
);

class LengthError extends Error {
  constructor(
    message: string,
    readonly position?: number,
  ) {
    super(message);
  }
}

/**
 * Reads a length the way shops write it — `19 3/4`, `19-3/4″`, `19¾`, `1′ 7-3/4″`, `1'7.75"`, `2'`,
 * `19.75 in`, `502`, `502 mm`, `50.2 cm`, `0.502 m`, `502,5 mm` — and returns millimetres.
 * Bare numbers are in the shop's `unit`. Anything else is refused with what was found, where, and what
 * was expected; nothing is guessed.
 */
export function parseLength(text: string, { unit }: { unit: LengthUnit }): ParsedLength {
  checkUnit(unit);
  if (typeof text !== 'string') return { ok: false, error: 'Enter a length.' };
  try {
    const chars = Array.from(text);
    return checkRange(new Parser(chars, tokenize(chars), unit).parse());
  } catch (e) {
    if (e instanceof LengthError) return { ok: false, error: e.message, position: e.position };
    throw e;
  }
}

/** A length given as a plain number in the shop's unit (a numeric form field or JSON body). */
export function lengthFromNumber(value: number, unit: LengthUnit): ParsedLength {
  checkUnit(unit);
  if (typeof value !== 'number' || !Number.isFinite(value)) return { ok: false, error: 'The length must be a finite number.' };
  return checkRange(unit === 'in' ? value * MM_PER_INCH : value);
}

/** The shop's unit comes from its settings, never from what was typed: a wrong one is a bug, not input to refuse. */
function checkUnit(unit: LengthUnit) {
  if (unit !== 'in' && unit !== 'mm') throw new RangeError(`The unit for bare numbers is "in" or "mm" (got ${String(unit)}).`);
}

function checkRange(mm: Mm): ParsedLength {
  if (!(mm > 0)) return { ok: false, error: 'A length must be greater than zero.' };
  if (mm < MIN_LENGTH_MM)
    return { ok: false, error: `That is under ${MIN_LENGTH_MM} mm — almost always a typing slip: check the number and its unit.` };
  if (mm > MAX_LENGTH_MM) return { ok: false, error: `That is longer than ${MAX_LENGTH_MM / 1000} m — check the unit.` };
  return { ok: true, mm };
}

const quote = (s: string) => `"${s}"`;

/** The text split into numbers, fractions, units and marks; a character that is none of these is refused where it is. */
function tokenize(chars: string[]): Token[] {
  const tokens: Token[] = [];
  let i = 0;
  while (i < chars.length) {
    const c = chars[i];
    const start = i;
    if (/\s/.test(c)) {
      i++;
      continue;
    }
    let token: Token;
    if (isDigit(c) || (c === '.' && isDigit(chars[i + 1]))) {
      token = readNumber(chars, start);
    } else if (c in VULGAR_FRACTIONS) {
      const [n, d] = VULGAR_FRACTIONS[c];
      token = { kind: 'glyph-fraction', start, end: start + 1, value: { n, d } };
    } else if (SUPERSCRIPT_DIGITS.includes(c)) {
      token = readRaisedFraction(chars, start);
    } else if (/[a-z]/i.test(c)) {
      token = readUnitWord(chars, start, tokens);
    } else if (FOOT_MARKS.has(c) && FOOT_MARKS.has(chars[i + 1] ?? '')) {
      token = { kind: 'unit', unit: 'in', start, end: start + 2 }; // two primes typed for a double prime: inches
    } else if (FOOT_MARKS.has(c) || INCH_MARKS.has(c)) {
      token = { kind: 'unit', unit: FOOT_MARKS.has(c) ? 'ft' : 'in', start, end: start + 1 };
    } else if (SLASHES.has(c)) {
      token = { kind: 'slash', start, end: start + 1 };
    } else if (DASHES.has(c)) {
      token = { kind: 'dash', start, end: start + 1 };
    } else if (APPROX_MARKS.has(c)) {
      token = { kind: 'approx', start, end: start + 1 };
    } else {
      throw new LengthError(`Unexpected ${quote(c)} at character ${i + 1}: a length has digits, fractions and a unit (${UNIT_HINT}).`, i + 1);
    }
    tokens.push(token);
    i = token.end;
  }
  return tokens;
}

const isDigit = (c: string | undefined) => c !== undefined && c >= '0' && c <= '9';

/** A decimal number from `start`: its digits and decimals, refusing a dangling separator and an ambiguous comma. */
function readNumber(chars: string[], start: number): Token {
  let i = start;
  let digits = '';
  while (isDigit(chars[i])) digits += chars[i++];
  let decimals = '';
  const sep = chars[i];
  if (sep === '.' || sep === ',') {
    if (!isDigit(chars[i + 1])) {
      // "in." style abbreviations never follow a bare number, so a dangling separator is a typo.
      throw new LengthError(`Expected a digit after ${quote(sep)} at character ${i + 2}.`, i + 2);
    }
    i++;
    while (isDigit(chars[i])) decimals += chars[i++];
    // "1,200" could be twelve hundred or 1.2; "0,502" and "1200,5" can only be decimals.
    if (sep === ',' && decimals.length === 3 && digits.length <= 3 && Number(digits) > 0) {
      throw new LengthError(
        `The comma at character ${start + digits.length + 1} is ambiguous (thousands or decimals?): write ${digits}${decimals} or ${Number(`${digits}.${decimals}`)}.`,
        start + digits.length + 1,
      );
    }
  }
  const scale = 10 ** decimals.length;
  // "1.200" may be 1.2 or twelve hundred, written the European way; in millimetres it is refused as ambiguous.
  const thousandsDot = sep === '.' && decimals.length === 3 && digits.length >= 1 && digits.length <= 3 && Number(digits) > 0;
  return { kind: 'number', start, end: i, whole: decimals === '', thousandsDot, value: { n: Number(digits + decimals), d: scale } };
}

/** A fraction typed as raised digits, a fraction slash and lowered digits (like ³⁄₁₆). */
function readRaisedFraction(chars: string[], start: number): Token {
  let i = start;
  let num = '';
  while (i < chars.length && SUPERSCRIPT_DIGITS.includes(chars[i])) num += SUPERSCRIPT_DIGITS.indexOf(chars[i++]);
  if (!SLASHES.has(chars[i] ?? ''))
    throw new LengthError(`Expected ${quote(FRACTION_SLASH)} after the raised numerator at character ${i + 1}.`, i + 1);
  i++;
  let den = '';
  while (i < chars.length && SUBSCRIPT_DIGITS.includes(chars[i])) den += SUBSCRIPT_DIGITS.indexOf(chars[i++]);
  if (den === '') throw new LengthError(`Expected a lowered denominator (like ₁₆) at character ${i + 1}.`, i + 1);
  return { kind: 'glyph-fraction', start, end: i, value: { n: Number(num), d: Number(den) } };
}

/** A unit written as a word (`in`, `inches`, `ft.`, `mm`…); any other word is refused, as not a length when it comes first. */
function readUnitWord(chars: string[], start: number, before: readonly Token[]): Token {
  let i = start;
  let word = '';
  while (i < chars.length && /[a-z]/i.test(chars[i])) word += chars[i++];
  const unit = UNIT_WORDS[word.toLowerCase()];
  if (!unit) {
    const first = before.every((t) => t.kind === 'approx');
    throw new LengthError(
      first
        ? `${quote(word)} is not a length: start with a number, like 19 3/4, 1′ 7-3/4″ or 502 mm.`
        : `${quote(word)} is not a unit Kerfwise reads (at character ${start + 1}): use ${UNIT_HINT}.`,
      start + 1,
    );
  }
  if (chars[i] === '.' && (unit === 'in' || unit === 'ft') && !isDigit(chars[i + 1])) i++; // "in." / "ft."
  return { kind: 'unit', unit, start, end: i };
}

type Quantity = Ratio & { shape: 'decimal' | 'whole' | 'fraction'; thousandsDot?: string };

class Parser {
  private i = 0;

  constructor(
    private readonly chars: string[],
    private readonly tokens: Token[],
    private readonly shopUnit: LengthUnit,
  ) {}

  parse(): Mm {
    if (this.tokens.length === 0) throw new LengthError('Enter a length.');
    if (this.peek()?.kind === 'approx') this.i++; // a pasted "≈19-3/4″" means what it says
    if (this.peek()?.kind === 'dash') throw new LengthError('A length must be greater than zero: remove the minus sign.', this.peek()!.start + 1);

    const first = this.quantity();
    const unit = this.unit();
    if (unit?.unit === 'ft' && this.peek()) return this.feetAndInches(first);
    this.expectEnd(
      unit ? `after ${quote(this.text(unit))} the length is complete` : `expected a fraction (like 3/4), a unit (${UNIT_HINT}) or the end`,
    );

    const resolved = unit?.unit ?? this.shopUnit;
    if (first.shape === 'fraction' && resolved !== 'in' && resolved !== 'ft') {
      throw new LengthError(
        unit
          ? `Fractions are for inches and feet: write ${resolved} as a decimal (like 12.5 ${resolved}).`
          : `A fraction means inches, but this shop's bare numbers are mm: add ″ or "in", or write the length in mm.`,
      );
    }
    if (first.thousandsDot && resolved === 'mm') {
      const [whole, part] = first.thousandsDot.split('.');
      throw new LengthError(
        `${quote(first.thousandsDot)} could be ${Number(first.thousandsDot)} mm or ${whole}${part} mm: write ${Number(first.thousandsDot)} or ${whole}${part}.`,
        1,
      );
    }
    return toMm(first, resolved);
  }

  private feetAndInches(feet: Quantity): Mm {
    if (this.peek()?.kind === 'dash') this.i++; // 1′-7″, the architects' way
    const inches = this.quantity();
    const mark = this.unit();
    if (mark && mark.unit !== 'in')
      throw new LengthError(`After feet only inches may follow, not ${quote(this.text(mark))} (character ${mark.start + 1}).`, mark.start + 1);
    this.expectEnd(mark ? 'the length is complete after the inches' : 'expected ″ or the end after the inches');
    if (feet.shape !== 'whole') throw new LengthError('Write whole feet before the inches (like 1′ 7-3/4″), or give it all in inches.');
    if (inches.n >= 12 * inches.d) throw new LengthError('The inches after the feet must be less than 12.');
    return toMm(feet, 'ft') + toMm(inches, 'in');
  }

  /** A number, a mixed number (19 3/4, 19-3/4, 19¾) or a fraction (3/4, ¾). */
  private quantity(): Quantity {
    const t = this.next('expected a number');
    if (t.kind === 'glyph-fraction') return { ...t.value, shape: 'fraction' };
    if (t.kind !== 'number') throw this.unexpected(t, 'expected a number');

    const after = this.peek();
    if (after?.kind === 'slash') {
      this.i++;
      const fraction = this.fractionFrom(t);
      const extra = this.peek();
      if (extra?.kind === 'slash')
        throw new LengthError(`Only one fraction bar is allowed (a second at character ${extra.start + 1}).`, extra.start + 1);
      return fraction;
    }
    const startsFraction = (k: Token | undefined, n: Token | undefined) =>
      k?.kind === 'glyph-fraction' || (k?.kind === 'number' && n?.kind === 'slash');
    if (after?.kind === 'dash' || startsFraction(after, this.peek(1))) {
      if (after?.kind === 'dash') {
        this.i++;
        if (!startsFraction(this.peek(), this.peek(1))) throw this.unexpectedNext('expected a fraction (like 3/4) after the dash');
      }
      if (!t.whole) throw new LengthError(`A fraction can only follow a whole number, not ${quote(this.text(t))}.`, t.start + 1);
      const part = this.properFraction();
      return { n: t.value.n * part.d + part.n, d: part.d, shape: 'fraction' };
    }
    return { ...t.value, shape: t.whole ? 'whole' : 'decimal', ...(t.thousandsDot ? { thousandsDot: this.text(t) } : {}) };
  }

  private properFraction(): Ratio {
    const t = this.next('expected a fraction');
    let f: Ratio;
    if (t.kind === 'glyph-fraction') f = t.value;
    else if (t.kind === 'number') {
      this.i++; // the slash, checked by the caller
      f = this.fractionFrom(t);
    } else throw this.unexpected(t, 'expected a fraction');
    if (f.n >= f.d) throw new LengthError(`The fraction in a mixed number must be less than 1 (got ${f.n}/${f.d}).`, t.start + 1);
    return f;
  }

  /** numerator has been read and the slash consumed. */
  private fractionFrom(numerator: Token & { kind: 'number' }): Quantity {
    const den = this.next('expected the denominator of the fraction');
    if (den.kind !== 'number') throw this.unexpected(den, 'expected the denominator of the fraction');
    if (!numerator.whole || !den.whole)
      throw new LengthError('A fraction needs whole numbers above and below the bar (like 3/4).', (numerator.whole ? den : numerator).start + 1);
    if (den.value.n === 0) throw new LengthError(`Division by zero: the denominator at character ${den.start + 1} is 0.`, den.start + 1);
    return { n: numerator.value.n, d: den.value.n, shape: 'fraction' };
  }

  private unit(): (Token & { kind: 'unit' }) | undefined {
    const t = this.peek();
    if (t?.kind !== 'unit') return undefined;
    this.i++;
    return t;
  }

  private expectEnd(expected: string) {
    const t = this.peek();
    if (!t) return;
    if (t.kind === 'unit')
      throw new LengthError(`Unexpected ${quote(this.text(t))} at character ${t.start + 1}: the length already has its unit.`, t.start + 1);
    throw this.unexpected(t, expected);
  }

  private peek(ahead = 0): Token | undefined {
    return this.tokens[this.i + ahead];
  }

  private next(expected: string): Token {
    const t = this.tokens[this.i++];
    if (!t) throw new LengthError(`The length ends too soon: ${expected} at character ${this.chars.length + 1}.`, this.chars.length + 1);
    return t;
  }

  private unexpectedNext(expected: string): LengthError {
    const t = this.peek();
    return t ? this.unexpected(t, expected) : new LengthError(`The length ends too soon: ${expected}.`, this.chars.length + 1);
  }

  private unexpected(t: Token, expected: string): LengthError {
    return new LengthError(`Unexpected ${quote(this.text(t))} at character ${t.start + 1}: ${expected}.`, t.start + 1);
  }

  private text(t: Token): string {
    return this.chars.slice(t.start, t.end).join('');
  }
}

function toMm(q: Ratio, unit: Unit): Mm {
  const [num, den] = MM_PER[unit];
  return (q.n * num) / (q.d * den);
}

import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { inches, MM_PER_INCH } from './length';
import { MAX_LENGTH_MM, parseLength } from './parse-length';

const inShop = (text: string) => parseLength(text, { unit: 'in' });
const mmShop = (text: string) => parseLength(text, { unit: 'mm' });

// Expected values are worked by hand from 1 in = 25.4 mm exactly and 1 ft = 12 in (NIST SP 811).
describe('reading the ways a shop writes a length', () => {
  test.each([
    ['NIST SP 811: 19 3/4 in = 19.75 × 25.4 = 501.65 mm', '19 3/4', 501.65],
    ['NIST SP 811: 19-3/4 with a hyphen', '19-3/4', 501.65],
    ['NIST SP 811: 19-3/4" with an inch mark', '19-3/4"', 501.65],
    ['NIST SP 811: 19¾ with a fraction glyph', '19¾', 501.65],
    ['NIST SP 811: 19 ¾″ with a space and a double prime', '19 ¾″', 501.65],
    ['NIST SP 811: 1′ 7-3/4″ = 19.75 in', '1\' 7-3/4"', 501.65],
    ['NIST SP 811: 1′7.75″ with primes and no space', '1′7.75″', 501.65],
    ["NIST SP 811: 1′-7 3/4″ with the architects' dash", '1′-7 3/4″', 501.65],
    ['NIST SP 811: 1 ft 7 3/4 in in words', '1 ft 7 3/4 in', 501.65],
    ['NIST SP 811: smart quotes 19-3/4” from a phone keyboard', '19-3/4”', 501.65],
    ['NIST SP 811: two apostrophes for an inch mark', "19-3/4''", 501.65],
    ['NIST SP 811: 2′ = 24 in = 609.6 mm', "2'", 609.6],
    ['NIST SP 811: 19.75 in', '19.75 in', 501.65],
    ['NIST SP 811: 19.75in without a space', '19.75in', 501.65],
    ['NIST SP 811: 19.75 inches', '19.75 inches', 501.65],
    ['NIST SP 811: 19 in. with an abbreviation point', '19 in.', 482.6],
    ['NIST SP 811: ⅛ alone = 3.175 mm', '⅛', 3.175],
    ['NIST SP 811: 3/16″ alone = 4.7625 mm', '3/16″', 4.7625],
    ['NIST SP 811: 5/4 (an improper fraction) = 1.25 in', '5/4', 31.75],
    ['NIST SP 811: raised and lowered digits 19³⁄₁₆″', '19³⁄₁₆″', 487.3625],
    ['NIST SP 811: a pasted approximate value ≈2′ 3-1/2″ = 27.5 in', '≈2′ 3-1/2″', 698.5],
    ['NIST SP 811: 19,75 in with a decimal comma', '19,75 in', 501.65],
    ['SI: 502 mm', '502 mm', 502],
    ['SI: 50.2 cm = 502 mm', '50.2 cm', 502],
    ['SI: 0.502 m = 502 mm', '0.502 m', 502],
    ['SI: 0,502 m with a decimal comma', '0,502 m', 502],
    ['SI: 502,5 mm with a decimal comma', '502,5 mm', 502.5],
    ['SI: 18 millimetres in words', '18 millimetres', 18],
  ])('%s', (_label, text, mm) => {
    expect(inShop(text)).toEqual({ ok: true, mm: expect.closeTo(mm, 9) });
  });

  test.each([
    ['a bare number in an inch shop is inches (19.75 × 25.4)', 'in', '19.75', 501.65],
    ['a bare number in a metric shop is millimetres', 'mm', '502', 502],
    ['a bare decimal-comma number in a metric shop is millimetres', 'mm', '502,5', 502.5],
    ['a marked inch length is inches in a metric shop too', 'mm', '19-3/4"', 501.65],
    ['three decimals of an inch are plain inches (1.125 × 25.4)', 'in', '1.125', 28.575],
    ['three decimals of a metre are plain metres (1.250 m)', 'mm', '1.250 m', 1250],
    ['a dot with two decimals is a decimal in mm', 'mm', '1.25', 1.25],
  ] as const)('%s', (_label, unit, text, mm) => {
    expect(parseLength(text, { unit })).toEqual({ ok: true, mm: expect.closeTo(mm, 9) });
  });
});

describe('refusing what is not a length, saying where and why', () => {
  test.each([
    ['an empty field', '', /enter a length/i, undefined],
    ['a zero denominator', '3/0', /denominator at character 3 is 0/, 3],
    ['two fraction bars', '1/2/3', /only one fraction bar.*character 4/i, 4],
    ['a second unit after mm', '5 mm"', /character 5.*already has its unit/, 5],
    ['a negative length', '-5', /greater than zero.*minus/, 1],
    ['zero', '0', /greater than zero/, undefined],
    ['a fraction of zero', '0/4″', /greater than zero/, undefined],
    ['a stray number', '19 3', /"3" at character 4: expected a fraction/, 4],
    ['a fraction after a decimal', '19.5 1/4', /only follow a whole number/, 1],
    ['a dash with no fraction after it', '19-3', /character 4: expected a fraction/, 4],
    ['a fraction of 1 or more in a mixed number', '19 5/4', /less than 1 \(got 5\/4\)/, 4],
    ['a decimal in a fraction', '3.5/4', /whole numbers above and below/, 1],
    ['an unknown unit', '12 yd', /"yd" is not a unit Kerfwise reads \(at character 4\)/, 4],
    ['words, not a length', 'abc', /^"abc" is not a length: start with a number, like 19 3\/4/, 1],
    ['a multiplication sign', '19 3/4 × 12', /"×" at character 8/, 8],
    ['a dangling decimal point', '19.', /digit after "\." at character 4/, 4],
    ['an ambiguous thousands comma', '1,200 mm', /ambiguous.*1200 or 1\.2/, 2],
    ['an ambiguous thousands dot in millimetres', '1.200 mm', /^"1\.200" could be 1\.2 mm or 1200 mm: write 1\.2 or 1200\.$/, 1],
    ['a length under half a millimetre', '0.3 mm', /under 0\.5 mm/, undefined],
    ['a fraction bar with nothing after it', '3/', /ends too soon.*denominator/, 3],
    ['12 or more inches after feet', '1\' 14"', /less than 12/, undefined],
    ['decimal feet followed by inches', '1.5′ 3″', /whole feet/, undefined],
    ['millimetres after feet', "1' 20 mm", /only inches may follow.*"mm"/, 7],
    ['a fraction of a millimetre', '3/4 mm', /fractions are for inches.*decimal/i, undefined],
    ['a length past the sanity limit', '200 m', /longer than 100 m/, undefined],
    ['a ≈ in the middle', '19 ≈ 3/4', /"≈" at character 4/, 4],
  ])('%s: %s', (_label, text, message, position) => {
    const result = inShop(text);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.error).toMatch(message);
    expect(result.position).toBe(position);
  });

  test('a bare fraction in a metric shop asks for an inch mark instead of guessing', () => {
    const result = mmShop('19 3/4');
    expect(result).toMatchObject({ ok: false, error: expect.stringMatching(/fraction means inches/) });
  });
});

describe('properties', () => {
  test('the inch is exactly 25.4 mm (NIST SP 811)', () => {
    expect(MM_PER_INCH).toBe(25.4);
    expect(inShop('1"')).toEqual({ ok: true, mm: 25.4 });
    expect(mmShop('2.54 cm')).toEqual({ ok: true, mm: 25.4 });
  });

  test('any whole number of sixty-fourths of an inch from 1/32″ up reads back exactly as the same mm (1/64″ is under the 0.5 mm floor)', () => {
    expect(inShop('1/64"').ok).toBe(false);
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 400 }), fc.integer({ min: 0, max: 63 }), (whole, n64) => {
        fc.pre(whole > 0 || n64 > 1);
        const text = n64 ? `${whole} ${n64}/64"` : `${whole}"`;
        const parsed = inShop(text);
        expect(parsed).toEqual({ ok: true, mm: expect.closeTo(inches(whole + n64 / 64), 9) });
      }),
    );
  });

  test('feet and inches read the same as the inches alone', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 20 }), fc.integer({ min: 0, max: 11 }), fc.integer({ min: 0, max: 15 }), (ft, inch, n16) => {
        const frac = n16 ? `-${n16}/16` : '';
        const a = inShop(`${ft}′ ${inch}${frac}″`);
        const b = inShop(`${ft * 12 + inch}${frac}″`);
        expect(a.ok && b.ok && a.mm).toBeCloseTo(b.ok ? b.mm : NaN, 9);
      }),
    );
  });

  test('no string makes the parser throw, and every accepted length is positive and finite', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom(...'0123456789 ./-,\'"′″¾⅛³⁄₁₆≈inmcft'.split('')), maxLength: 14 }), (text) => {
        const r = parseLength(text, { unit: 'in' });
        if (r.ok) expect(r.mm > 0 && r.mm <= MAX_LENGTH_MM).toBe(true);
        else expect(r.error.length).toBeGreaterThan(0);
      }),
      { numRuns: 2000 },
    );
  });
});

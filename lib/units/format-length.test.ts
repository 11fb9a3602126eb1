import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import type { ShopUnits } from '@/shared/schemas/units';
import { shopLengthUnit } from '@/shared/schemas/units';
import { inches } from './length';
import { formatLength, type LengthStyle, precisionStepMm } from './format-length';
import { parseLength } from './parse-length';

const sixteenths: ShopUnits = { system: 'imperial', precision: 16, feet: false };
const thirtySeconds: ShopUnits = { system: 'imperial', precision: 32, feet: false };
const feet16: ShopUnits = { system: 'imperial', precision: 16, feet: true };
const wholeMm: ShopUnits = { system: 'metric', precision: 1, feet: false };
const halfMm: ShopUnits = { system: 'metric', precision: 0.5, feet: false };

// Inputs are exact inch or mm values (1 in = 25.4 mm, NIST SP 811), so the expected text is the definition read back.
describe('showing a length in the shop’s unit', () => {
  test.each([
    ['NIST SP 811: 19.75 in to 1/16″', inches(19.75), sixteenths, 'hyphen', '19-3/4″'],
    ['NIST SP 811: 1/8 in alone, no leading zero', inches(1 / 8), sixteenths, 'hyphen', '1/8″'],
    ['NIST SP 811: 8/16 in lowest terms is 1/2', inches(8 / 16), sixteenths, 'hyphen', '1/2″'],
    ['NIST SP 811: 27.5 in with feet is 2′ 3-1/2″', inches(27.5), feet16, 'hyphen', '2′ 3-1/2″'],
    ['NIST SP 811: 24 in with feet is 2′', inches(24), feet16, 'hyphen', '2′'],
    ['NIST SP 811: 24.5 in with feet is 2′ 1/2″', inches(24.5), feet16, 'hyphen', '2′ 1/2″'],
    ['NIST SP 811: 11.75 in stays in inches under a foot', inches(11.75), feet16, 'hyphen', '11-3/4″'],
    ['NIST SP 811: 19.75 in as a glyph', inches(19.75), sixteenths, 'unicode', '19¾″'],
    ['NIST SP 811: 3/16 in typeset with raised and lowered digits', inches(3 / 16), sixteenths, 'unicode', '³⁄₁₆″'],
    ['NIST SP 811: 27.5 in with feet, glyphs', inches(27.5), feet16, 'unicode', '2′ 3½″'],
    ['NIST SP 811: plain quotes for CSV and labels', inches(27.5), feet16, 'ascii', `2' 3-1/2"`],
    ['NIST SP 811: 5/32 in to 1/32″', inches(5 / 32), thirtySeconds, 'hyphen', '5/32″'],
    ['NIST SP 811: 5/32 in to 1/16″ is rounded, so marked', inches(5 / 32), sixteenths, 'hyphen', '≈3/16″'],
    ['NIST SP 811: 502 mm is 19.764 in, nearest 1/16″ is 19-3/4″', 502, sixteenths, 'hyphen', '≈19-3/4″'],
    ['NIST SP 811: rounded in ASCII is marked with ~', 502, sixteenths, 'ascii', '~19-3/4"'],
    ['SI: 502 mm to 1 mm', 502, wholeMm, 'hyphen', '502 mm'],
    ['SI: 502.5 mm to 0.5 mm', 502.5, halfMm, 'hyphen', '502.5 mm'],
    ['SI: 502.5 mm to 1 mm rounds half away from zero', 502.5, wholeMm, 'hyphen', '≈503 mm'],
    ['SI: 19.75 in = 501.65 mm to 0.5 mm', inches(19.75), halfMm, 'hyphen', '≈501.5 mm'],
    ['SI: a shrinkage of −3 mm keeps its sign', -3, wholeMm, 'hyphen', '−3 mm'],
  ] as const)('%s', (_label, mm, units, style, expected) => {
    expect(formatLength(mm, units, { style: style as LengthStyle })).toBe(expected);
  });

  test('the inch step is 25.4 mm over the denominator and the metric step is the precision itself', () => {
    expect(precisionStepMm(sixteenths)).toBe(1.5875);
    expect(precisionStepMm(thirtySeconds)).toBe(0.79375);
    expect(precisionStepMm(halfMm)).toBe(0.5);
  });
});

const shops: ShopUnits[] = [sixteenths, thirtySeconds, feet16, { system: 'imperial', precision: 32, feet: true }, wholeMm, halfMm];
const styles: LengthStyle[] = ['hyphen', 'unicode', 'ascii'];
const length = fc.double({ min: 2, max: 50_000, noNaN: true });
const withoutApprox = (s: string) => s.replace(/^[≈~]/, '');

describe('properties', () => {
  test('reading a formatted length back lands within half a precision step of the original', () => {
    fc.assert(
      fc.property(length, fc.constantFrom(...shops), fc.constantFrom(...styles), (mm, units, style) => {
        const parsed = parseLength(formatLength(mm, units, { style }), { unit: shopLengthUnit(units) });
        expect(parsed.ok).toBe(true);
        if (parsed.ok) expect(Math.abs(parsed.mm - mm)).toBeLessThanOrEqual(precisionStepMm(units) / 2 + 1e-9);
      }),
    );
  });

  test('formatting is idempotent and the ≈ mark disappears once the value is exact', () => {
    fc.assert(
      fc.property(length, fc.constantFrom(...shops), fc.constantFrom(...styles), (mm, units, style) => {
        const once = formatLength(mm, units, { style });
        const parsed = parseLength(once, { unit: shopLengthUnit(units) });
        if (!parsed.ok) throw new Error(parsed.error);
        expect(formatLength(parsed.mm, units, { style })).toBe(withoutApprox(once));
      }),
    );
  });

  test('a whole number of precision steps is shown without ≈', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 20_000 }), fc.constantFrom(...shops), (steps, units) => {
        expect(formatLength(steps * precisionStepMm(units), units)).not.toMatch(/^[≈~]/);
      }),
    );
  });
});

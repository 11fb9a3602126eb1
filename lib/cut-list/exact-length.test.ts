import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { parseLength } from '@/lib/units/parse-length';
import { exactLengthText } from './exact-length';

const IMPERIAL = { system: 'imperial', precision: 16, feet: false } as const;
const METRIC = { system: 'metric', precision: 1, feet: false } as const;

describe('lengths written so they read back exactly', () => {
  test.each([
    [inches(19.75), IMPERIAL, '19-3/4″'],
    [inches(23 / 32), IMPERIAL, '23/32″'],
    [18, IMPERIAL, '18 mm'],
    [502.5, METRIC, '502.5 mm'],
    [18.256, METRIC, '18.26 mm'],
  ] as const)('%f mm in %j is %s (25.4 mm to the inch, NIST SP 811)', (mm, units, text) => {
    expect(exactLengthText(mm, units)).toBe(text);
  });

  test('reading the text back gives the length to within 0.005 mm', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 3000, noNaN: true }), fc.constantFrom(IMPERIAL, METRIC), (mm, units) => {
        const back = parseLength(exactLengthText(mm, units), { unit: units.system === 'imperial' ? 'in' : 'mm' });
        expect(back.ok).toBe(true);
        if (back.ok) expect(Math.abs(back.mm - mm)).toBeLessThanOrEqual(0.005 + 1e-9);
      }),
    );
  });
});

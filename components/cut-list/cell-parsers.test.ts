import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { cellText, parseCell } from './cell-parsers';

const IMPERIAL = { system: 'imperial', precision: 16, feet: false } as const;
const METRIC = { system: 'metric', precision: 1, feet: false } as const;

describe('a cut list cell reads what was typed in the shop’s unit', () => {
  test.each([
    ['length', '19 3/4', IMPERIAL, inches(19.75)],
    ['length', '1\' 7-3/4"', IMPERIAL, inches(19.75)],
    ['length', '502 mm', IMPERIAL, 502],
    ['width', '50.2cm', METRIC, 502],
    ['jointAllowance', '', IMPERIAL, 0],
    ['quantity', ' 12 ', METRIC, 12],
    ['material', '  Maple ply ', METRIC, 'Maple ply'],
  ] as const)('%s “%s” → %s (25.4 mm to the inch, NIST SP 811)', (column, text, units, value) => {
    const parsed = parseCell(column, text, units);
    expect(parsed.ok).toBe(true);
    if (parsed.ok && typeof value === 'number') expect(parsed.value as number).toBeCloseTo(value, 9);
    else if (parsed.ok) expect(parsed.value).toBe(value);
  });

  test.each([
    ['quantity', '2.5', 'whole number'],
    ['quantity', '0', 'at least 1'],
    ['length', 'three', '"three" is not a length'],
    ['length', '0', 'greater than zero'],
    ['label', '   ', 'Give the part a name'],
  ] as const)('%s “%s” is refused on the cell: %s', (column, text, message) => {
    const parsed = parseCell(column, text, METRIC);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.error).toContain(message);
  });

  test('a stock thickness shows exactly; a joint allowance of zero shows empty', () => {
    const part = { label: 'x', quantity: 1, length: 500, width: 300, thickness: 18, material: 'MDF', jointAllowance: 0, notes: '' };
    expect(cellText(part, 'thickness', IMPERIAL)).toBe('18 mm');
    expect(cellText(part, 'jointAllowance', IMPERIAL)).toBe('');
  });
});

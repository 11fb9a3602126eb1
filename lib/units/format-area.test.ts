import { describe, expect, test } from 'vitest';
import { formatArea } from './format-area';

const imperial = { system: 'imperial', precision: 16, feet: false } as const;
const metric = { system: 'metric', precision: 1, feet: false } as const;

describe('showing an area', () => {
  test.each([
    ['NIST SP 811: a 4×8 ft panel (1219.2 × 2438.4 mm, derived from 25.4 mm exactly) is exactly 32 ft²', 1219.2 * 2438.4, imperial, '32 ft²'],
    ['SI: a metric 2440 × 1220 panel is 2.9768 m², shown to 0.01', 2440 * 1220, metric, '≈2.98 m²'],
    ['NIST SP 811: the metric panel in ft² is 32.04 (2.9768 / 0.09290304)', 2440 * 1220, imperial, '≈32.04 ft²'],
    ['SI: 1 m² exactly', 1_000_000, metric, '1 m²'],
  ] as const)('%s', (_label, mm2, units, expected) => {
    expect(formatArea(mm2, units)).toBe(expected);
  });

  test('more decimals can be asked for', () => {
    expect(formatArea(2440 * 1220, metric, { decimals: 4 })).toBe('2.9768 m²');
  });
});

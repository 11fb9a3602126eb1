import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { quarterGlyphs, quoteLength, quoteNominal } from './quote-text';

const IN16 = { system: 'imperial', precision: 16, feet: false } as const;

describe('lengths and thicknesses on a quote (common practice, no source: ¾″ as a shop writes it)', () => {
  test('quarters and halves as glyphs, other fractions as written, lumber quarters untouched', () => {
    expect(quoteLength(inches(19.75), IN16)).toBe('19¾″');
    expect(quoteLength(inches(96), IN16)).toBe('96″');
    expect(quoteLength(inches(19 + 5 / 16), IN16)).toBe('19-5/16″');
    expect(quoteNominal('3/4"')).toBe('¾″');
    expect(quoteNominal('1/2"')).toBe('½″');
    expect(quoteNominal('5/4')).toBe('5/4');
    expect(quoteNominal('18 mm')).toBe('18 mm');
    expect(quarterGlyphs('1-1/2″ × 3/4″')).toBe('1½″ × ¾″');
  });
  test('a metric shop sees millimetres', () => {
    expect(quoteLength(2440, { system: 'metric', precision: 1, feet: false })).toBe('2440 mm');
  });
});

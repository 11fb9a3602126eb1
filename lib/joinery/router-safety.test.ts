import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { ROUTER_TABLE_CAUTIONS, maxRouterSpeedRpm } from '@/lib/joinery/router-safety';

describe('router bit speed by diameter', () => {
  test.each([
    { label: '¾″ bit: up to 24,000 rpm (router bit-speed table, common practice, no source)', diameterIn: 3 / 4, rpm: 24_000 },
    { label: '1″ bit: 24,000 rpm (common practice, no source)', diameterIn: 1, rpm: 24_000 },
    { label: '1½″ bit: 18,000 rpm (common practice, no source)', diameterIn: 1.5, rpm: 18_000 },
    { label: '2¼″ bit: 16,000 rpm (common practice, no source)', diameterIn: 2.25, rpm: 16_000 },
    { label: '3″ bit: 12,000 rpm (common practice, no source)', diameterIn: 3, rpm: 12_000 },
    { label: '3½″ bit: 12,000 rpm (common practice, no source)', diameterIn: 3.5, rpm: 12_000 },
  ])('$label', ({ diameterIn, rpm }) => {
    expect(maxRouterSpeedRpm(inches(diameterIn))).toBe(rpm);
  });

  test('a bit over 3½″ has no speed from the table: the bit maker must say', () => {
    expect(maxRouterSpeedRpm(inches(4))).toBeNull();
  });
});

describe('router-table cautions', () => {
  test.each(['manual', 'local codes', 'licensed practice', 'guard', 'featherboard', 'push block', 'eye', 'hearing', 'dust', 'rpm'])(
    'mention %s',
    (word) => {
      expect(ROUTER_TABLE_CAUTIONS.join(' ').toLowerCase()).toContain(word);
    },
  );
});

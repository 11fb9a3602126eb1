import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { bottomMovementWarning, speciesOf } from './bottom-movement';

const UNITS = { system: 'imperial', precision: 16, feet: false } as const;
const schedule = (bottom: object) =>
  drawerScheduleSchema.parse({
    label: 'Test',
    quantity: 1,
    size: { from: 'box', width: inches(14), height: inches(5), depth: inches(20) },
    bottom,
  });

describe('solid-wood drawer bottoms', () => {
  test.each([
    ['White oak', 'white-oak', 'flatsawn'],
    ['Quartersawn white oak', 'white-oak', 'quartersawn'],
    ['Cherry', 'black-cherry', 'flatsawn'],
    ['Oak', null, null],
    ['Maple ply', null, null],
    ['Baltic birch', null, null],
  ])('%s is read as %s %s', (material, species, cut) => {
    const found = speciesOf(material);
    expect(found ? [found.species, found.cut] : [null, null]).toEqual([species, cut]);
  });

  // FPL Wood Handbook eq. 13-2 with C_T = 0.00365 (white oak, table 13-5): 20″ × 0.00365 × 6 % ≈ 0.44″, far past a 1/16″ groove play.
  test('a 20″ flatsawn white oak bottom in a groove is warned about (FPL Wood Handbook, eq. 13-2)', () => {
    const warning = bottomMovementWarning(schedule({ mount: 'groove', material: 'White oak', thickness: inches(1 / 4) }), inches(20), UNITS);
    expect(warning).toContain('white oak');
    expect(warning).toContain('0.438″');
  });

  test('a plywood bottom never is', () => {
    expect(bottomMovementWarning(schedule({ mount: 'applied', material: 'Baltic birch ply' }), inches(20), UNITS)).toBeNull();
  });
});

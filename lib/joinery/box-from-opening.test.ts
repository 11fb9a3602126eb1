import { describe, expect, test } from 'vitest';
import { inches, toInches } from '@/lib/units/length';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { boxFromOpening } from '@/lib/joinery/box-from-opening';
import { IMPERIAL_SLIDE_LENGTHS } from '@/lib/joinery/defaults';

const parse = (over: object) => drawerScheduleSchema.parse({ label: 'O', quantity: 1, ...over });

describe('box from the opening', () => {
  test('standard slide lengths run 12–28″ in 2″ steps (common practice, no source)', () => {
    const expected = [12, 14, 16, 18, 20, 22, 24, 26, 28];
    expect(IMPERIAL_SLIDE_LENGTHS).toHaveLength(expected.length);
    IMPERIAL_SLIDE_LENGTHS.forEach((l, i) => expect(toInches(l)).toBeCloseTo(expected[i], 9));
  });

  test('a given box size is taken as it is', () => {
    const result = boxFromOpening(parse({ size: { from: 'box', width: 400, height: 150, depth: 500 } }));
    expect(result).toMatchObject({ ok: true, box: { width: 400, height: 150, depth: 500 }, slideLength: null });
  });

  test('side-mount slides: box height is the opening less ½″ (common practice, no source)', () => {
    const result = boxFromOpening(parse({ size: { from: 'opening', width: inches(15), height: inches(6), depth: inches(24) } }));
    if (!result.ok) throw new Error('refused');
    expect(result.box.height).toBeCloseTo(inches(5.5), 9);
    expect(result.slideLength).toBeCloseTo(inches(22), 9); // 24″ less ½″ back clearance fits a 22″ slide
  });

  test('undermount slides take the maker’s height deduction', () => {
    const result = boxFromOpening(
      parse({
        size: { from: 'opening', width: 500, height: 200, depth: 560 },
        slide: { type: 'undermount', heightDeduction: 25, widthDeduction: 16 },
      }),
    );
    expect(result).toMatchObject({ ok: true, box: { width: 484, height: 175 } });
  });

  test('a chosen slide longer than the opening is deep is refused on that field', () => {
    const result = boxFromOpening(
      parse({ size: { from: 'opening', width: 500, height: 200, depth: 400, depthRule: { rule: 'slide-length', slideLength: 450 } } }),
    );
    expect(result).toMatchObject({ ok: false, errors: [{ path: 'size.depthRule.slideLength' }] });
  });

  test('an opening lower than the height clearance is refused on its height', () => {
    const result = boxFromOpening(parse({ size: { from: 'opening', width: 500, height: 10, depth: 560 } }));
    expect(result).toMatchObject({ ok: false, errors: [{ path: 'size.height' }] });
  });
});

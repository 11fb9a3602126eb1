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
    const result = boxFromOpening(parse({ size: { from: 'box', widthMm: 400, heightMm: 150, depthMm: 500 } }));
    expect(result).toMatchObject({ ok: true, box: { widthMm: 400, heightMm: 150, depthMm: 500 }, slideLengthMm: null });
  });

  test('side-mount slides: box height is the opening less ½″ (common practice, no source)', () => {
    const result = boxFromOpening(parse({ size: { from: 'opening', widthMm: inches(15), heightMm: inches(6), depthMm: inches(24) } }));
    if (!result.ok) throw new Error('refused');
    expect(result.box.heightMm).toBeCloseTo(inches(5.5), 9);
    expect(result.slideLengthMm).toBeCloseTo(inches(22), 9); // 24″ less ½″ back clearance fits a 22″ slide
  });

  test('undermount slides take the maker’s height deduction', () => {
    const result = boxFromOpening(
      parse({
        size: { from: 'opening', widthMm: 500, heightMm: 200, depthMm: 560 },
        slide: { type: 'undermount', heightDeductionMm: 25, widthDeductionMm: 16 },
      }),
    );
    expect(result).toMatchObject({ ok: true, box: { widthMm: 484, heightMm: 175 } });
  });

  test('a chosen slide longer than the opening is deep is refused on that field', () => {
    const result = boxFromOpening(
      parse({ size: { from: 'opening', widthMm: 500, heightMm: 200, depthMm: 400, depthRule: { rule: 'slide-length', slideLengthMm: 450 } } }),
    );
    expect(result).toMatchObject({ ok: false, errors: [{ path: 'size.depthRule.slideLengthMm' }] });
  });

  test('an opening lower than the height clearance is refused on its height', () => {
    const result = boxFromOpening(parse({ size: { from: 'opening', widthMm: 500, heightMm: 10, depthMm: 560 } }));
    expect(result).toMatchObject({ ok: false, errors: [{ path: 'size.heightMm' }] });
  });
});

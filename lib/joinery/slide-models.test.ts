import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import type { DrawerScheduleInput } from '@/shared/schemas/drawer-schedule';
import { slideModelSchema, type SlideModelInput } from '@/shared/schemas/slide-model';
import { sizeDrawerSchedule } from '@/lib/joinery/size-drawer-schedule';

/**
 * Two slide models specified the way makers specify them. Both are invented for these checks (no real maker's
 * figures), and every expected number below is worked by hand from the rule in the comment beside it.
 */
const INSIDE_RULE: SlideModelInput = {
  kind: 'undermount',
  name: 'Halbrook UM-58',
  lengths: [12, 15, 18, 21].map(inches),
  widthRule: 'inside', // inside width = opening − 1-5/8″
  widthDeduction: inches(1 + 5 / 8),
  maxSideThickness: inches(5 / 8),
  bottomRecess: inches(1 / 2),
  heightClearance: inches(3 / 4),
  rearClearance: inches(5 / 8),
};
const OUTSIDE_RULE: SlideModelInput = {
  kind: 'undermount',
  name: 'Tessel T-16',
  lengths: [250, 300, 350, 400, 450, 500, 550],
  widthRule: 'outside', // box width = opening − 10 mm
  widthDeduction: 10,
  maxSideThickness: 16,
  bottomRecess: 13,
  heightClearance: 20,
  rearClearance: 10,
};

const schedule = (
  model: SlideModelInput,
  opening: { width: number; height: number; depth: number },
  over: Partial<DrawerScheduleInput> = {},
): DrawerScheduleInput => ({
  label: 'On model slides',
  quantity: 2,
  size: { from: 'opening', ...opening },
  slide: { type: 'undermount', model },
  thickness: { front: inches(3 / 4), side: inches(1 / 2) },
  ...over,
});
const sized = (input: DrawerScheduleInput) => {
  const result = sizeDrawerSchedule(input);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result;
};

describe('boxes sized from a slide model (invented maker-style models, worked by hand)', () => {
  test('inside-width rule: a 15 × 7 × 22″ opening with ½″ sides → inside 15 − 1⅝ = 13⅜″, box 13⅜ + 2 × ½ = 14⅜″ wide, 7 − ¾ = 6¼″ high, on the 21″ slide (22 − ⅝ = 21⅜″ of room) and 21″ long', () => {
    const result = sized(schedule(INSIDE_RULE, { width: inches(15), height: inches(7), depth: inches(22) }));
    expect(result.box.insideWidth).toBeCloseTo(inches(13 + 3 / 8), 9);
    expect(result.box.width).toBeCloseTo(inches(14 + 3 / 8), 9);
    expect(result.box.height).toBeCloseTo(inches(6.25), 9);
    expect(result.box.depth).toBeCloseTo(inches(21), 9);
  });

  test('inside-width rule: thicker sides make a wider box with the same inside (⅝″ sides → 13⅜ + 1¼ = 14⅝″)', () => {
    const result = sized(
      schedule(
        INSIDE_RULE,
        { width: inches(15), height: inches(7), depth: inches(22) },
        { thickness: { front: inches(3 / 4), side: inches(5 / 8) } },
      ),
    );
    expect(result.box.insideWidth).toBeCloseTo(inches(13 + 3 / 8), 9);
    expect(result.box.width).toBeCloseTo(inches(14 + 5 / 8), 9);
  });

  test('outside-width rule: a 564 × 180 × 540 mm opening → box 564 − 10 = 554 mm wide, 180 − 20 = 160 mm high, on the 500 mm slide (540 − 10 = 530 mm of room) and 500 mm long', () => {
    const result = sized(schedule(OUTSIDE_RULE, { width: 564, height: 180, depth: 540 }, { thickness: { front: 16, side: 16 } }));
    expect(result.box).toMatchObject({ width: 554, height: 160, depth: 500, insideWidth: 522 });
    // The sides run the box's length less the lock rabbet's face left at each end (RULES.md): the box is the slide's length.
    expect(result.notes.join(' ')).toContain('as long as its slide');
  });

  test('the bottom groove rises to the model’s bottom recess (13 mm, above the ½″ default) and a lower one is refused', () => {
    const input = schedule(OUTSIDE_RULE, { width: 564, height: 180, depth: 540 }, { thickness: { front: 16, side: 16 } });
    const result = sized(input);
    expect(result.parts.find((p) => p.role === 'side')!.machining.join(' ')).toContain('its lower edge 13 mm above the bottom edge');
    const low = sizeDrawerSchedule({ ...input, bottom: { mount: 'groove', groove: { height: 12 } } });
    expect(low).toMatchObject({
      ok: false,
      errors: [{ path: 'bottom.groove.height', message: expect.stringContaining('Tessel T-16 need the bottom at least 13 mm up') }],
    });
  });

  test('sides thicker than the model is made for are a field error (18 mm on a 16 mm slide)', () => {
    const result = sizeDrawerSchedule(schedule(OUTSIDE_RULE, { width: 564, height: 180, depth: 540 }, { thickness: { front: 18, side: 18 } }));
    expect(result).toMatchObject({
      ok: false,
      errors: [{ path: 'thickness.side', message: expect.stringContaining('takes sides up to 16 mm; these are 18 mm') }],
    });
  });

  test('16 mm sides on a ⅝″ (15.9 mm) slide are within tolerance and raise no note', () => {
    const result = sized(schedule(INSIDE_RULE, { width: inches(15), height: inches(7), depth: inches(22) }, { thickness: { front: 16, side: 16 } }));
    expect(result.notes.join(' ')).not.toMatch(/sides up to|over/);
  });

  test('an opening too shallow for the shortest length the model is made in is refused on the depth', () => {
    const result = sizeDrawerSchedule(schedule(OUTSIDE_RULE, { width: 564, height: 180, depth: 255 }));
    expect(result).toMatchObject({
      ok: false,
      errors: [{ path: 'size.depth', message: expect.stringContaining('No Tessel T-16 fits: 245 mm of depth') }],
    });
  });

  test('the schedule carries the model’s whole rule, so it sizes the same whatever later happens to the model', () => {
    const input = schedule(OUTSIDE_RULE, { width: 564, height: 180, depth: 540 }, { thickness: { front: 16, side: 16 } });
    const stored = JSON.parse(JSON.stringify(input));
    expect(sized(stored).parts).toEqual(sized(input).parts);
    expect(stored.slide.model.widthDeduction).toBe(10);
  });

  test('a side-mount model cannot be hung as an undermount slide', () => {
    const result = sizeDrawerSchedule(schedule({ ...OUTSIDE_RULE, kind: 'side-mount' }, { width: 564, height: 180, depth: 540 }));
    expect(result).toMatchObject({ ok: false, errors: [{ path: 'slide.model.kind' }] });
  });
});

describe('undermount slides without a model (schedules saved before models)', () => {
  test('16 mm sides raise no “sides over ⅝″” note: 16 mm is what undermount slides are made for (from memory)', () => {
    const result = sized({
      ...schedule(INSIDE_RULE, { width: 500, height: 200, depth: 560 }),
      slide: { type: 'undermount' },
      thickness: { front: 16, side: 16 },
    });
    expect(result.notes.join(' ')).not.toContain('sides up to');
  });

  test('19 mm sides still ask to check the maker’s spec', () => {
    const result = sized({
      ...schedule(INSIDE_RULE, { width: 500, height: 200, depth: 560 }),
      slide: { type: 'undermount' },
      thickness: { front: 19, side: 19 },
    });
    expect(result.notes.join(' ')).toContain("check the maker's spec for 19 mm sides");
  });
});

describe('a slide model as Shop settings keeps it', () => {
  test('lengths are kept shortest first, each once', () => {
    expect(slideModelSchema.parse({ ...OUTSIDE_RULE, lengths: [500, 250, 400] }).lengths).toEqual([250, 400, 500]);
    expect(slideModelSchema.safeParse({ ...OUTSIDE_RULE, lengths: [500, 500] }).success).toBe(false);
  });

  test.each([
    ['no lengths', { lengths: [] }],
    ['a length of NaN', { lengths: [Number.NaN] }],
    ['an infinite deduction', { widthDeduction: Number.POSITIVE_INFINITY }],
    ['a negative rear clearance', { rearClearance: -1 }],
    ['a kilometre of height clearance', { heightClearance: 1_000_000 }],
    ['an unknown width rule', { widthRule: 'middle' }],
    ['no name', { name: '  ' }],
  ])('refuses %s', (_label, bad) => {
    expect(slideModelSchema.safeParse({ ...OUTSIDE_RULE, ...bad }).success).toBe(false);
  });
});

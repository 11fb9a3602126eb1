import { describe, expect, test } from 'vitest';
import { sizeDrawerSchedule } from '@/lib/joinery';
import { stockMatchWarning, type StockOffer } from '@/lib/cut-list/stock-match';
import { inches } from '@/lib/units/length';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { emptySchedule, fromSchedule, scheduleFormSchema, slideModelChoices, toScheduleInput } from './schedule-form-values';

const IMPERIAL = { system: 'imperial', precision: 16, feet: false } as const;
const METRIC = { system: 'metric', precision: 1, feet: false } as const;

/** Baltic birch as it is sold: metric sheets named by the nearest inch size (common practice, no source). */
const BALTIC_BIRCH: StockOffer[] = [
  { material: 'Baltic birch', kind: 'sheet', thickness: 18, nominal: '3/4"' },
  { material: 'Baltic birch', kind: 'sheet', thickness: 12, nominal: '1/2"' },
  { material: 'Baltic birch', kind: 'sheet', thickness: 6, nominal: '1/4"' },
];

function sizeDefaults(offers: StockOffer[]) {
  const text = { ...emptySchedule(IMPERIAL, offers), label: 'Base drawers', width: '14', height: '6', depth: '22' };
  const values = scheduleFormSchema('in').parse(text);
  const sized = sizeDrawerSchedule(drawerScheduleSchema.parse(toScheduleInput(values)));
  if (!sized.ok) throw new Error(sized.errors.map((e) => e.message).join('; '));
  return { text, sized };
}

describe('a new drawer schedule with the form’s defaults', () => {
  test('takes ¾″, ½″ and ¼″ Baltic birch as the stock room’s 18, 12 and 6 mm sheets, so every part has stock', () => {
    const { text, sized } = sizeDefaults(BALTIC_BIRCH);
    expect([text.frontThickness, text.sideThickness, text.bottomThickness]).toEqual(['18 mm', '12 mm', '6 mm']);
    expect(new Set(sized.parts.map((p) => p.thickness))).toEqual(new Set([18, 12, 6]));
    for (const part of sized.parts) expect(stockMatchWarning(part, BALTIC_BIRCH, IMPERIAL)).toBeNull();
  });

  test('sizes the joints on the actual stock: an 18 mm front keeps 18/2 − ⅛″ of face, the bottom spans 12 mm sides', () => {
    const { sized } = sizeDefaults(BALTIC_BIRCH);
    const side = sized.parts.find((p) => p.role === 'side')!;
    const bottom = sized.parts.find((p) => p.role === 'bottom')!;
    // Opening 22″ deep → the longest standard slide that fits behind ½″ clearance is 20″ (RULES.md), and the lock
    // rabbet leaves face left = t/2 − ⅛″ of each 18 mm front (RULES.md; ⅛″ on ½″, ¼″ on ¾″ stock): side = 20″ − 2 × 5.825 mm.
    expect(side.length).toBeCloseTo(inches(20) - 2 * (18 / 2 - inches(1 / 8)), 9);
    // Inside width = box width − 2 × 12 mm; the bottom is inside + 2 × ¼″ groove depth − 1/16″ (RULES.md, bottom).
    const boxWidth = inches(14) - 2 * inches(1 / 2);
    expect(bottom.length).toBeCloseTo(boxWidth - 2 * 12 + 2 * inches(1 / 4) - inches(1 / 16), 9);
  });

  test('keeps the nominal thicknesses when the stock room has none of the material', () => {
    const { text } = sizeDefaults([]);
    expect([text.frontThickness, text.sideThickness, text.bottomThickness]).toEqual(['3/4″', '1/2″', '1/4″']);
  });
});

describe('one carcass sized in a metric shop and an imperial shop', () => {
  // A 600 mm frameless base carcass with 18 mm sides: a 564 mm opening, 200 mm high, 560 mm deep.
  const size = (units: typeof METRIC | typeof IMPERIAL, opening: { width: string; height: string; depth: string }) => {
    const text = { ...emptySchedule(units), label: 'Base drawers', ...opening };
    const unit = units.system === 'metric' ? 'mm' : 'in';
    const sized = sizeDrawerSchedule(drawerScheduleSchema.parse(toScheduleInput(scheduleFormSchema(unit).parse(text))));
    if (!sized.ok) throw new Error(sized.errors.map((e) => e.message).join('; '));
    return { text, sized };
  };

  test('a metric shop gets metric slides by default: 12.5 mm per side and a 500 mm slide, so the box is 539 mm wide and 500 mm long (derived from common practice; metric lengths from memory)', () => {
    const { text, sized } = size(METRIC, { width: '564', height: '200', depth: '560' });
    expect(text.slideSeries).toBe('metric');
    expect(sized.box.width).toBeCloseTo(539, 9);
    expect(sized.box.depth).toBeCloseTo(500, 9);
    expect(sized.parts.find((p) => p.role === 'side')!.length).toBeLessThanOrEqual(500);
  });

  test('an imperial shop gets imperial slides by default: ½″ per side and a 20″ slide for the same carcass (common practice, no source)', () => {
    const { text, sized } = size(IMPERIAL, { width: '564 mm', height: '200 mm', depth: '560 mm' });
    expect(text.slideSeries).toBe('imperial');
    expect(sized.box.width).toBeCloseTo(564 - 2 * inches(1 / 2), 9);
    expect(sized.box.depth).toBeCloseTo(inches(20), 9);
  });

  test('a metric slide can be chosen in an imperial shop, and the choice is what is saved', () => {
    const text = {
      ...emptySchedule(IMPERIAL),
      label: 'Euro slides',
      width: '564 mm',
      height: '200 mm',
      depth: '560 mm',
      slideSeries: 'metric' as const,
    };
    const input = toScheduleInput(scheduleFormSchema('in').parse(text));
    expect(input.slide).toEqual({ type: 'side-mount', series: 'metric' });
    const sized = sizeDrawerSchedule(drawerScheduleSchema.parse(input));
    expect(sized.ok && sized.box.depth).toBeCloseTo(500, 9);
  });
});

describe('slide models in the schedule form', () => {
  // An invented maker-style model: inside width = opening − 1-5/8″, sides up to ⅝″ (worked by hand below).
  const MODEL = {
    id: '7d0c4f1e-2a3b-4c5d-8e9f-0a1b2c3d4e5f',
    kind: 'undermount' as const,
    name: 'Halbrook UM-58',
    lengths: [12, 15, 18, 21].map(inches),
    widthRule: 'inside' as const,
    widthDeduction: inches(1 + 5 / 8),
    maxSideThickness: inches(5 / 8),
    bottomRecess: inches(1 / 2),
    heightClearance: inches(3 / 4),
    rearClearance: inches(5 / 8),
  };
  const text = {
    ...emptySchedule(IMPERIAL),
    label: 'Undermount bank',
    width: '15',
    height: '7',
    depth: '22',
    slideType: 'undermount' as const,
    sideThickness: '1/2',
  };

  test('undermount slides need a model: without one the form says where models come from', () => {
    const none = scheduleFormSchema('in', []).safeParse(text);
    expect(none.success).toBe(false);
    expect(none.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['slideModel', expect.stringContaining('the owner adds them in Shop settings')],
    ]);
    expect(scheduleFormSchema('in', [MODEL]).safeParse(text).error?.issues[0].message).toBe(
      'Choose the slide model: its maker’s rule sizes the box.',
    );
  });

  test('the chosen model’s rule goes into the schedule and sizes the box: 15″ − 1⅝″ = 13⅜″ inside, 14⅜″ outside, 21″ long (invented model, worked by hand)', () => {
    const input = toScheduleInput(scheduleFormSchema('in', [MODEL]).parse({ ...text, slideModel: MODEL.id }), [
      { ...MODEL, updatedAt: '2026-01-01' } as typeof MODEL,
    ]);
    expect(input.slide).toEqual({ type: 'undermount', model: MODEL });
    const sized = sizeDrawerSchedule(drawerScheduleSchema.parse(input));
    if (!sized.ok) throw new Error(JSON.stringify(sized.errors));
    expect(sized.box.width).toBeCloseTo(inches(14 + 3 / 8), 9);
    expect(sized.box.depth).toBeCloseTo(inches(21), 9);
  });

  test('a schedule whose model was deleted since still offers the rule it was saved with', () => {
    const saved = drawerScheduleSchema.parse({
      label: 'Old',
      quantity: 1,
      size: { from: 'opening', width: 400, height: 150, depth: 560 },
      slide: { type: 'undermount', model: MODEL },
    });
    const choices = slideModelChoices([], saved);
    expect(choices).toEqual([{ ...MODEL, retired: true }]);
    expect(fromSchedule(saved, IMPERIAL).slideModel).toBe(MODEL.id);
    const again = toScheduleInput(scheduleFormSchema('in', choices).parse(fromSchedule(saved, IMPERIAL)), choices);
    expect(again.slide).toEqual({ type: 'undermount', model: MODEL });
  });
});

describe('lipped fronts in the schedule form', () => {
  test('a blank overlay takes the shop’s own default: ⅜″ in an inch shop, 10 mm in a metric one (common practice, no source)', () => {
    const inch = toScheduleInput(
      scheduleFormSchema('in').parse({ ...emptySchedule(IMPERIAL), label: 'L', width: '15', height: '7', depth: '22', frontStyle: 'lipped' }),
      [],
      'in',
    );
    expect(inch.front).toEqual({ style: 'lipped', fit: 'overlay', overlay: inches(3 / 8) });
    const mm = toScheduleInput(
      scheduleFormSchema('mm').parse({ ...emptySchedule(METRIC), label: 'L', width: '564', height: '200', depth: '560', frontStyle: 'lipped' }),
      [],
      'mm',
    );
    expect(mm.front).toEqual({ style: 'lipped', fit: 'overlay', overlay: 10 });
  });

  test('a reveal typed in is kept, and a saved lipped front reads back into the same fields', () => {
    const text = {
      ...emptySchedule(IMPERIAL),
      label: 'L',
      width: '15',
      height: '7',
      depth: '22',
      frontStyle: 'lipped' as const,
      frontFit: 'reveal' as const,
      frontLipAmount: '1/8',
    };
    const saved = drawerScheduleSchema.parse(toScheduleInput(scheduleFormSchema('in').parse(text), [], 'in'));
    expect(saved.front).toEqual({ style: 'lipped', fit: 'reveal', reveal: inches(1 / 8) });
    expect(fromSchedule(saved, IMPERIAL)).toMatchObject({ frontStyle: 'lipped', frontFit: 'reveal', frontLipAmount: '1/8″' });
  });

  test('a lipped front saved before fits existed reads back as a lip past the box', () => {
    const old = drawerScheduleSchema.parse({
      label: 'Old',
      quantity: 1,
      size: { from: 'opening', width: inches(15), height: inches(7), depth: inches(22) },
      front: { style: 'lipped', lip: inches(1 / 2) },
    });
    expect(old.front).toEqual({ style: 'lipped', fit: 'lip', lip: inches(1 / 2) });
    expect(fromSchedule(old, IMPERIAL)).toMatchObject({ frontFit: 'lip', frontLipAmount: '1/2″' });
  });
});

import { describe, expect, test } from 'vitest';
import { sizeDrawerSchedule } from '@/lib/joinery';
import { stockMatchWarning, type StockOffer } from '@/lib/cut-list/stock-match';
import { inches } from '@/lib/units/length';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { emptySchedule, scheduleFormSchema, toScheduleInput } from './schedule-form-values';

const IMPERIAL = { system: 'imperial', precision: 16, feet: false } as const;
const METRIC = { system: 'metric', precision: 1, feet: false } as const;

/** Baltic birch as it is sold: metric sheets named by the nearest inch size (common practice, no source). */
const BALTIC_BIRCH: StockOffer[] = [
  { material: 'Baltic birch', kind: 'sheet', thicknessMm: 18, nominal: '3/4"' },
  { material: 'Baltic birch', kind: 'sheet', thicknessMm: 12, nominal: '1/2"' },
  { material: 'Baltic birch', kind: 'sheet', thicknessMm: 6, nominal: '1/4"' },
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
    expect(new Set(sized.parts.map((p) => p.thicknessMm))).toEqual(new Set([18, 12, 6]));
    for (const part of sized.parts) expect(stockMatchWarning(part, BALTIC_BIRCH, IMPERIAL)).toBeNull();
  });

  test('sizes the joints on the actual stock: an 18 mm front keeps 18/2 − ⅛″ of face, the bottom spans 12 mm sides', () => {
    const { sized } = sizeDefaults(BALTIC_BIRCH);
    const side = sized.parts.find((p) => p.role === 'side')!;
    const bottom = sized.parts.find((p) => p.role === 'bottom')!;
    // Opening 22″ deep → the longest standard slide that fits behind ½″ clearance is 20″ (RULES.md), and the lock
    // rabbet leaves face left = t/2 − ⅛″ of each 18 mm front (RULES.md; ⅛″ on ½″, ¼″ on ¾″ stock): side = 20″ − 2 × 5.825 mm.
    expect(side.lengthMm).toBeCloseTo(inches(20) - 2 * (18 / 2 - inches(1 / 8)), 9);
    // Inside width = box width − 2 × 12 mm; the bottom is inside + 2 × ¼″ groove depth − 1/16″ (RULES.md, bottom).
    const boxWidth = inches(14) - 2 * inches(1 / 2);
    expect(bottom.lengthMm).toBeCloseTo(boxWidth - 2 * 12 + 2 * inches(1 / 4) - inches(1 / 16), 9);
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
    expect(sized.box.widthMm).toBeCloseTo(539, 9);
    expect(sized.box.depthMm).toBeCloseTo(500, 9);
    expect(sized.parts.find((p) => p.role === 'side')!.lengthMm).toBeLessThanOrEqual(500);
  });

  test('an imperial shop gets imperial slides by default: ½″ per side and a 20″ slide for the same carcass (common practice, no source)', () => {
    const { text, sized } = size(IMPERIAL, { width: '564 mm', height: '200 mm', depth: '560 mm' });
    expect(text.slideSeries).toBe('imperial');
    expect(sized.box.widthMm).toBeCloseTo(564 - 2 * inches(1 / 2), 9);
    expect(sized.box.depthMm).toBeCloseTo(inches(20), 9);
  });

  test('a metric slide can be chosen in an imperial shop, and the choice is what is saved', () => {
    const text = { ...emptySchedule(IMPERIAL), label: 'Euro slides', width: '564 mm', height: '200 mm', depth: '560 mm', slideSeries: 'metric' as const };
    const input = toScheduleInput(scheduleFormSchema('in').parse(text));
    expect(input.slide).toEqual({ type: 'side-mount', series: 'metric' });
    const sized = sizeDrawerSchedule(drawerScheduleSchema.parse(input));
    expect(sized.ok && sized.box.depthMm).toBeCloseTo(500, 9);
  });
});

import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import type { DrawerScheduleInput } from '@/shared/schemas/drawer-schedule';
import { sizeDrawerSchedule } from '@/lib/joinery/size-drawer-schedule';

/** A 15″ × 7″ × 22″ opening on imperial side-mount slides (½″ each side): a 14″ lock-rabbet box, ½″ sides, ¾″ front. */
const onOpening = (front: DrawerScheduleInput['front']): DrawerScheduleInput => ({
  label: 'Lipped bank',
  quantity: 1,
  size: { from: 'opening', width: inches(15), height: inches(7), depth: inches(22) },
  thickness: { front: inches(3 / 4), side: inches(1 / 2) },
  front,
});
const sized = (input: DrawerScheduleInput) => {
  const result = sizeDrawerSchedule(input);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result;
};
const frontOf = (input: DrawerScheduleInput) => sized(input).parts.find((p) => p.role === 'front')!;

describe('lipped box fronts meet the opening with an overlay or a reveal', () => {
  test('by default a lipped front laps the opening ⅜″ each side, the classic lipped drawer: 15 + 2 × ⅜ = 15¾″, ⅞″ past each side of the 14″ box (common practice, no source)', () => {
    const result = sized(onOpening({ style: 'lipped' }));
    const front = result.parts.find((p) => p.role === 'front')!;
    expect(front.length).toBeCloseTo(inches(15.75), 9);
    expect(front.overhang).toBeCloseTo(inches(7 / 8), 9);
    expect(result.face).toMatchObject({ role: 'front', opening: { width: inches(15) }, lipped: true });
    expect(result.face.sideMargin).toBeCloseTo(-inches(3 / 8), 9);
    expect(result.warnings).toEqual([]);
  });

  test('a reveal stops inside the opening: 1/16″ each side → 15 − ⅛ = 14⅞″, 7/16″ past each side of the box (hand arithmetic)', () => {
    const result = sized(onOpening({ style: 'lipped', fit: 'reveal' }));
    expect(result.parts.find((p) => p.role === 'front')!.length).toBeCloseTo(inches(14 + 7 / 8), 9);
    expect(result.face.sideMargin).toBeCloseTo(inches(1 / 16), 9);
    expect(result.warnings).toEqual([]);
  });

  test('the joint on the front is set in the side plus the lip, so the box behind is unchanged', () => {
    const front = frontOf(onOpening({ style: 'lipped', fit: 'overlay', overlay: inches(1 / 4) }));
    // 15 + ½ = 15½″ front on a 14″ box: ¾″ lip each side; the groove sits ½″ + ¾″ = 1¼″ = 31.75 mm from the end.
    expect(front.length).toBeCloseTo(inches(15.5), 9);
    expect(front.machining.join(' ')).toContain('set 31.8 mm from the end');
  });

  test('a lip as wide as the slide gap makes a front exactly as wide as the opening, and that is warned: it would rub', () => {
    const result = sized(onOpening({ style: 'lipped', lip: inches(1 / 2) }));
    expect(result.parts.find((p) => p.role === 'front')!.length).toBeCloseTo(inches(15), 9);
    expect(result.warnings).toEqual([expect.stringContaining('leaves no gap each side of the 381 mm opening: it will rub or bind')]);
  });

  test('a reveal of less than 1 mm is warned; a reveal that leaves no lip is refused on the reveal', () => {
    expect(sized(onOpening({ style: 'lipped', fit: 'reveal', reveal: 0.5 })).warnings).toEqual([expect.stringContaining('only 0.5 mm each side')]);
    const none = sizeDrawerSchedule(onOpening({ style: 'lipped', fit: 'reveal', reveal: inches(1 / 2) }));
    expect(none).toMatchObject({ ok: false, errors: [{ path: 'front.reveal', message: expect.stringContaining('no wider than the box') }] });
  });

  test('a box given by its size has no opening to lap: the lip must be given outright', () => {
    const input = {
      ...onOpening({ style: 'lipped' }),
      size: { from: 'box', width: inches(14), height: inches(6), depth: inches(22) },
    } as const;
    expect(sizeDrawerSchedule(input)).toMatchObject({ ok: false, errors: [{ path: 'front.fit' }] });
    const lip = sized({ ...input, front: { style: 'lipped', fit: 'lip', lip: inches(1 / 2) } });
    expect(lip.face).toMatchObject({ opening: null, sideMargin: null });
    expect(lip.parts.find((p) => p.role === 'front')!.length).toBeCloseTo(inches(15), 9);
  });

  test('an inset applied front with no reveal is warned; with 1.5 mm it is not (frameless reveal, common practice, no source)', () => {
    const base = { ...onOpening({ style: 'applied', fit: 'inset', reveal: 0 }) };
    expect(sized(base).warnings).toEqual([expect.stringContaining('The applied front (381 mm) leaves no gap')]);
    expect(sized({ ...base, front: { style: 'applied', fit: 'inset', reveal: 1.5 } }).warnings).toEqual([]);
  });

  test('an overlay applied front sits outside the opening and is shown against it', () => {
    const result = sized({ ...onOpening({ style: 'applied' }), size: { from: 'opening', width: 564, height: 200, depth: 560 } });
    expect(result.face).toMatchObject({ role: 'applied-front', width: 597, height: 233, sideMargin: -16.5 });
  });
});

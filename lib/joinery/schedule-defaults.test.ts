import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';

describe('a schedule filled with few fields takes the trade defaults', () => {
  const s = drawerScheduleSchema.parse({ label: 'Kitchen base', quantity: 3, size: { from: 'opening', width: 400, height: 150, depth: 560 } });

  test('side-mount slides of the imperial series, with ½″ per side and ½″ in height (common practice, no source)', () => {
    expect(s.slide).toEqual({ type: 'side-mount', series: 'imperial', sideClearance: inches(1 / 2), heightClearance: inches(1 / 2) });
  });

  test('metric side-mount slides take 12.5 mm per side and above, the metric half inch (derived from common practice)', () => {
    const m = drawerScheduleSchema.parse({ label: 'M', quantity: 1, size: s.size, slide: { type: 'side-mount', series: 'metric' } }).slide;
    expect(m).toEqual({ type: 'side-mount', series: 'metric', sideClearance: 12.5, heightClearance: 12.5 });
  });

  test('a clearance given outright is kept whatever the series', () => {
    const m = drawerScheduleSchema.parse({
      label: 'M',
      quantity: 1,
      size: s.size,
      slide: { type: 'side-mount', series: 'metric', sideClearance: 13 },
    }).slide;
    expect(m).toMatchObject({ sideClearance: 13, heightClearance: 12.5 });
  });

  test('a lock-rabbet box, ¾″ front with ½″ sides, front flush; the ¾″ front keeps a ¼″ face (Woodsmith, "Locking rabbet joint")', () => {
    expect(s.joint).toEqual({ method: 'lock-rabbet', faceLeft: inches(1 / 4) });
    expect(s.thickness).toEqual({ front: inches(3 / 4), side: inches(1 / 2) });
    expect(s.front).toEqual({ style: 'flush' });
  });

  test.each([
    ['a ½″ front keeps ⅛″ (a ⅜″ cut into ½″ stock, common practice, no source)', inches(1 / 2), inches(1 / 8)],
    ['a ¾″ front keeps ¼″ (Woodsmith, "Locking rabbet joint")', inches(3 / 4), inches(1 / 4)],
    ['a ⅝″ front keeps 3/16″, on the line through both (derived)', inches(5 / 8), inches(3 / 16)],
    ['an 18 mm front keeps 9 − 3.175 = 5.825 mm (derived)', 18, 5.825],
  ])('the lock rabbet’s face left follows the front: %s', (_label, front, faceLeft) => {
    const joint = drawerScheduleSchema.parse({ label: 'L', quantity: 1, size: s.size, thickness: { front, side: inches(1 / 2) } }).joint;
    expect(joint).toEqual({ method: 'lock-rabbet', faceLeft: expect.closeTo(faceLeft, 9) });
  });

  test('a face left given outright is kept whatever the front', () => {
    expect(drawerScheduleSchema.parse({ label: 'L', quantity: 1, size: s.size, joint: { method: 'lock-rabbet', faceLeft: 2 } }).joint).toEqual({
      method: 'lock-rabbet',
      faceLeft: 2,
    });
  });

  test('a ¼″ plywood bottom in a ¼ × ¼″ groove ½″ up with 1/16″ clearance, grain free (common practice, no source)', () => {
    expect(s.bottom).toEqual({
      mount: 'groove',
      thickness: inches(1 / 4),
      material: 'plywood',
      grain: 'any',
      groove: { width: inches(1 / 4), depth: inches(1 / 4), height: inches(1 / 2), clearance: inches(1 / 16) },
    });
  });

  test('undermount slides default to ⅝″ total width deduction and a ½″ bottom recess (common practice, no source)', () => {
    const u = drawerScheduleSchema.parse({ label: 'U', quantity: 1, size: s.size, slide: { type: 'undermount' } }).slide;
    expect(u).toMatchObject({ widthDeduction: inches(5 / 8), bottomRecess: inches(1 / 2) });
  });

  test('an applied front laps 18 − 1.5 mm: full overlay on 18 mm carcass sides with the frameless 1.5 mm reveal (common practice, no source)', () => {
    const f = drawerScheduleSchema.parse({ label: 'F', quantity: 1, size: s.size, front: { style: 'applied' } }).front;
    expect(f).toMatchObject({ fit: 'overlay', overlay: { side: 16.5, top: 16.5, bottom: 16.5 }, reveal: 1.5 });
  });
});

import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';

describe('a schedule filled with few fields takes the trade defaults', () => {
  const s = drawerScheduleSchema.parse({ label: 'Kitchen base', quantity: 3, size: { from: 'opening', widthMm: 400, heightMm: 150, depthMm: 560 } });

  test('side-mount slides with ½″ per side and ½″ in height (common practice, no source)', () => {
    expect(s.slide).toEqual({ type: 'side-mount', sideClearanceMm: inches(1 / 2), heightClearanceMm: inches(1 / 2) });
  });

  test('a lock-rabbet box, ¾″ front with ½″ sides, front flush (common practice, no source)', () => {
    expect(s.joint).toEqual({ method: 'lock-rabbet', faceLeftMm: inches(1 / 8) });
    expect(s.thickness).toEqual({ frontMm: inches(3 / 4), sideMm: inches(1 / 2) });
    expect(s.front).toEqual({ style: 'flush' });
  });

  test('a ¼″ plywood bottom in a ¼ × ¼″ groove ½″ up with 1/16″ clearance, grain free (common practice, no source)', () => {
    expect(s.bottom).toEqual({
      mount: 'groove',
      thicknessMm: inches(1 / 4),
      material: 'plywood',
      grain: 'any',
      groove: { widthMm: inches(1 / 4), depthMm: inches(1 / 4), heightMm: inches(1 / 2), clearanceMm: inches(1 / 16) },
    });
  });

  test('undermount slides default to ⅝″ total width deduction and a ½″ bottom recess (common practice, no source)', () => {
    const u = drawerScheduleSchema.parse({ label: 'U', quantity: 1, size: s.size, slide: { type: 'undermount' } }).slide;
    expect(u).toMatchObject({ widthDeductionMm: inches(5 / 8), bottomRecessMm: inches(1 / 2) });
  });

  test('an applied front laps 18 − 1.5 mm: full overlay on 18 mm carcass sides with the frameless 1.5 mm reveal (common practice, no source)', () => {
    const f = drawerScheduleSchema.parse({ label: 'F', quantity: 1, size: s.size, front: { style: 'applied' } }).front;
    expect(f).toMatchObject({ fit: 'overlay', overlayMm: { side: 16.5, top: 16.5, bottom: 16.5 }, revealMm: 1.5 });
  });
});

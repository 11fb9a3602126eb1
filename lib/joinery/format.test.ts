import { describe, expect, test } from 'vitest';
import { formatLength } from '@/lib/units/format-length';
import { inches } from '@/lib/units/length';
import { mmText } from './format';
import { sizeDrawerSchedule } from './size-drawer-schedule';

const schedule = {
  label: 'Desk drawers',
  quantity: 2,
  size: { from: 'opening' as const, width: inches(15), height: inches(5.5), depth: inches(21) },
  thickness: { front: inches(3 / 4), side: inches(1 / 2) },
};
const imperial = { system: 'imperial' as const, precision: 16 as const, feet: false };

describe('lengths in drawer notes', () => {
  test('a rule’s own figures are written exactly: a metric shop to the whole mm still reads 12.5 mm a side, not ≈13 (derived from common practice)', () => {
    const metric = { system: 'metric' as const, precision: 1 as const, feet: false };
    const result = sizeDrawerSchedule(
      { ...schedule, size: { from: 'opening', width: 564, height: 200, depth: 560 }, slide: { type: 'side-mount', series: 'metric' } },
      { lengthText: (mm) => formatLength(mm, metric), exactText: (mm) => `${mm} mm` },
    );
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.notes[0]).toBe('Box 539 mm wide = opening 564 mm − 2 × 12.5 mm metric side-mount slide clearance.');
    expect(result.notes[1]).toBe('Box 500 mm deep to suit the longest standard metric slide that fits the opening (250 mm–650 mm).');
  });

  test("are written in the shop's unit when the caller names it (15″ opening − ½″ a side → 14″ box, common practice, no source)", () => {
    const result = sizeDrawerSchedule(schedule, { lengthText: (mm) => formatLength(mm, imperial) });
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    const notes = [...result.notes, ...result.parts.flatMap((p) => p.machining)].join(' ');
    expect(notes).toContain('Box 14″ wide = opening 15″');
    expect(notes).not.toMatch(/\d mm\b/);
  });

  test('are plain millimetres by default, and the writer does not outlive the call', () => {
    sizeDrawerSchedule(schedule, { lengthText: () => 'X' });
    const result = sizeDrawerSchedule(schedule);
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.notes.join(' ')).toContain('Box 355.6 mm wide = opening 381 mm');
    expect(mmText(25.4)).toBe('25.4 mm');
  });
});

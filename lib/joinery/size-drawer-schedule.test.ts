import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import type { DrawerScheduleInput } from '@/shared/schemas/drawer-schedule';
import { sizeDrawerSchedule } from '@/lib/joinery/size-drawer-schedule';
import type { DrawerPart, DrawerPartRole } from '@/lib/joinery/types';

/** The worked-example box of RULES.md: W 14″ × H 6″ × D 22″, ¾″ front and back, ½″ sides. */
const base = (over: Partial<DrawerScheduleInput> = {}): DrawerScheduleInput => ({
  label: 'Test bank',
  quantity: 1,
  size: { from: 'box', width: inches(14), height: inches(6), depth: inches(22) },
  thickness: { front: inches(3 / 4), side: inches(1 / 2) },
  ...over,
});

function sized(input: DrawerScheduleInput) {
  const result = sizeDrawerSchedule(input);
  if (!result.ok) throw new Error(`expected a box, got ${JSON.stringify(result.errors)}`);
  return result;
}
const part = (parts: DrawerPart[], role: DrawerPartRole): DrawerPart => {
  const found = parts.find((p) => p.role === role);
  if (!found) throw new Error(`no ${role}`);
  return found;
};
const box = (widthIn: number, depthIn: number) => ({ from: 'box', width: inches(widthIn), height: inches(6), depth: inches(depthIn) }) as const;

describe('part lengths follow each joint’s rule', () => {
  test.each([
    {
      label: 'lock rabbet: a bit cutting ⅜″ into ½″ stock leaves ⅛″, so a 20″ deep box has 19-3/4″ sides (common practice, no source)',
      input: base({ size: box(14, 20), thickness: { front: inches(1 / 2), side: inches(1 / 2) } }),
      role: 'side',
      inches: 19.75,
    },
    {
      label: 'lock rabbet: ¾″ stock with a ¼″ lip, D 22″ → side 21½″ (Woodsmith, "Locking rabbet joint")',
      input: base({ thickness: { front: inches(3 / 4), side: inches(3 / 4) }, joint: { method: 'lock-rabbet', faceLeft: inches(1 / 4) } }),
      role: 'side',
      inches: 21.5,
    },
    {
      label: 'lock rabbet: D 12″, lip 1/16″ → side 11⅞″ (Popular Woodworking, "Lock rabbet drawer joinery")',
      input: base({
        size: box(14, 12),
        thickness: { front: inches(1 / 2), side: inches(1 / 2) },
        joint: { method: 'lock-rabbet', faceLeft: inches(1 / 16) },
      }),
      role: 'side',
      inches: 11.875,
    },
    {
      label: 'rabbet and dado: W 14″, ½″ sides, ¼″ dado → front/back 13½″ (Woodsmith tip)',
      input: base({ joint: { method: 'rabbet-and-dado', dadoDepth: inches(1 / 4) } }),
      role: 'front',
      inches: 13.5,
    },
    {
      label: 'rabbet and dado: the back is cut like the front, 13½″ (Woodsmith tip)',
      input: base({ joint: { method: 'rabbet-and-dado', dadoDepth: inches(1 / 4) } }),
      role: 'back',
      inches: 13.5,
    },
    {
      label: 'half-blind dovetail: 3/16″ lap on a ¾″ front, D 22″ → side 21-13/16″ (Fine Woodworking)',
      input: base({ joint: { method: 'half-blind-dovetail', lap: inches(3 / 16) } }),
      role: 'side',
      inches: 21 + 13 / 16,
    },
    {
      label: 'butt, sides full depth: front/back 13″ (worked example, common practice, no source)',
      input: base({ joint: { method: 'butt-pocket-screw', layout: 'sides-full-depth' } }),
      role: 'front',
      inches: 13,
    },
    {
      label: 'butt, front/back full width: sides 20½″ (worked example, common practice, no source)',
      input: base({ joint: { method: 'butt-loose-tenon', layout: 'front-back-full-width' } }),
      role: 'side',
      inches: 20.5,
    },
    {
      label: 'through dovetail: sides run the full 22″ (common practice, no source)',
      input: base({ joint: { method: 'through-dovetail' } }),
      role: 'side',
      inches: 22,
    },
    {
      label: 'box joint: front runs the full 14″ (common practice, no source)',
      input: base({ joint: { method: 'box-joint' } }),
      role: 'front',
      inches: 14,
    },
  ] as const)('$label', ({ input, role, inches: expected }) => {
    expect(part(sized(input).parts, role).length).toBeCloseTo(inches(expected), 9);
  });
});

describe('lock rabbet (common practice, no source)', () => {
  test('fronts and backs are cut to the full box width, with no subtraction', () => {
    const { parts } = sized(base());
    expect(part(parts, 'front').length).toBeCloseTo(inches(14), 9);
    expect(part(parts, 'back').length).toBeCloseTo(inches(14), 9);
  });

  test('with a ¾″ front and ½″ sides the front is measured to the side thickness', () => {
    const front = part(sized(base()).parts, 'front');
    expect(front.thickness).toBeCloseTo(inches(3 / 4), 9);
    expect(front.endEngagement[0]).toBeCloseTo(inches(1 / 2), 9);
    expect(front.endEngagement[1]).toBeCloseTo(inches(1 / 2), 9);
    expect(front.machining.join(' ')).toContain('set 12.7 mm from the end');
  });

  test('a deeper front cut makes a front that overhangs each side to hide the slides', () => {
    const flush = sized(base());
    const lipped = sized(base({ front: { style: 'lipped', lip: inches(1 / 2) } }));
    const front = part(lipped.parts, 'front');
    expect(front.length).toBeCloseTo(inches(15), 9);
    expect(front.overhang).toBeCloseTo(inches(1 / 2), 9);
    expect(front.machining.join(' ')).toContain('set 25.4 mm from the end');
    // The box behind the front does not change.
    expect(part(lipped.parts, 'side').length).toBeCloseTo(part(flush.parts, 'side').length, 9);
    expect(part(lipped.parts, 'back').length).toBeCloseTo(inches(14), 9);
  });

  test('the joint allowance is shown apart from the inside span it is added to', () => {
    const result = sized(base({ size: box(14, 20), thickness: { front: inches(1 / 2), side: inches(1 / 2) } }));
    const side = part(result.parts, 'side');
    // Inside depth 19″; each tongue enters ⅜″ → 19 + ¾ = 19¾″ (common practice, no source).
    expect(result.box.insideDepth).toBeCloseTo(inches(19), 9);
    expect(side.jointAllowance).toBeCloseTo(inches(3 / 4), 9);
    expect(side.length).toBeCloseTo(result.box.insideDepth + side.jointAllowance, 9);
  });
});

describe('box size from the opening', () => {
  test('side-mount slides leave ½″ per side: a 15″ opening takes a 14″ box, ½″ lower than the opening (common practice, no source)', () => {
    const result = sized(base({ size: { from: 'opening', width: inches(15), height: inches(7), depth: inches(22.5) } }));
    expect(result.box.width).toBeCloseTo(inches(14), 9);
    expect(result.box.height).toBeCloseTo(inches(6.5), 9);
  });

  test('a 600 mm frameless carcass with 18 mm sides takes a 539 mm side-mount box and a 597 mm full-overlay front (derived from common practice: ½″ = 12.5 mm metric slide clearance, 1.5 mm frameless reveal)', () => {
    const result = sized(
      base({
        size: { from: 'opening', width: 600 - 2 * 18, height: 200, depth: 560 },
        slide: { type: 'side-mount', sideClearance: 12.5 },
        front: { style: 'applied' },
      }),
    );
    expect(result.box.width).toBeCloseTo(539, 9);
    expect(part(result.parts, 'applied-front').length).toBeCloseTo(597, 9);
  });

  test('metric side-mount slides leave 12.5 mm per side and come 250–650 mm long: a 564 × 200 × 560 mm opening takes a 539 × 187.5 mm box, 500 mm long (derived from common practice: 12.5 mm metric slide clearance; metric lengths from memory)', () => {
    const result = sized(base({ size: { from: 'opening', width: 564, height: 200, depth: 560 }, slide: { type: 'side-mount', series: 'metric' } }));
    expect(result.box.width).toBeCloseTo(539, 9);
    expect(result.box.height).toBeCloseTo(187.5, 9);
    expect(result.box.depth).toBeCloseTo(500, 9);
    expect(result.notes.join(' ')).toContain('2 × 12.5 mm metric side-mount slide clearance');
    expect(result.notes.join(' ')).toContain('longest standard metric slide');
  });

  test('the same opening with imperial slides takes ½″ per side and a 20″ slide (common practice, no source)', () => {
    // 564 − 2 × 12.7 = 538.6 mm; 560 mm less ½″ behind is 547.3 mm ≈ 21.5″, so the longest 2″-step slide is 20″.
    const result = sized(base({ size: { from: 'opening', width: 564, height: 200, depth: 560 }, slide: { type: 'side-mount', series: 'imperial' } }));
    expect(result.box.width).toBeCloseTo(538.6, 9);
    expect(result.box.depth).toBeCloseTo(inches(20), 9);
  });

  test('a schedule saved before slides had a series still sizes as it did: ½″ clearances and imperial lengths', () => {
    // As the form stored them: the schema's output with its defaults filled, no series, no depth rule.
    const stored = {
      ...base(),
      size: { from: 'opening', width: 564, height: 200, depth: 560 },
      slide: { type: 'side-mount', sideClearance: 12.7, heightClearance: 12.7 },
    };
    const result = sized(stored as DrawerScheduleInput);
    expect(result.box).toMatchObject({ width: 538.6, height: 187.3 });
    expect(result.box.depth).toBeCloseTo(inches(20), 9);
  });

  test.each([
    {
      label: 'a 22½″ deep opening with ½″ back clearance takes a 22″ slide (slide lengths 12–28″ by 2″, common practice, no source)',
      depthIn: 22.5,
      series: 'imperial',
      expected: inches(22),
    },
    { label: 'a 21.9″ deep opening takes a 20″ slide (common practice, no source)', depthIn: 21.9, series: 'imperial', expected: inches(20) },
    { label: 'a 560 mm deep opening takes a 500 mm metric slide (from memory)', depthIn: 560 / 25.4, series: 'metric', expected: 500 },
  ] as const)('$label', ({ depthIn, series, expected }) => {
    const result = sized(
      base({
        size: {
          from: 'opening',
          width: inches(15),
          height: inches(7),
          depth: inches(depthIn),
          depthRule: { rule: 'longest-standard-slide', series },
        },
      }),
    );
    expect(result.box.depth).toBeCloseTo(expected, 9);
  });

  test('undermount slides take the maker’s total width deduction, ⅝″ by default (common practice, no source)', () => {
    const result = sized(base({ size: { from: 'opening', width: inches(15), height: inches(7), depth: inches(22) }, slide: { type: 'undermount' } }));
    expect(result.box.width).toBeCloseTo(inches(15 - 5 / 8), 9);
  });

  test('wooden runners fill the opening less a back clearance', () => {
    const result = sized(
      base({
        size: { from: 'opening', width: 400, height: 150, depth: 500, depthRule: { rule: 'opening-less-clearance', backClearance: 10 } },
        slide: { type: 'wooden-runners', sideClearance: 1 },
      }),
    );
    expect(result.box.width).toBeCloseTo(398, 9);
    expect(result.box.depth).toBeCloseTo(490, 9);
  });
});

describe('bottoms', () => {
  test('a bottom in ¼ × ¼″ grooves is the inside plus 2 × ¼″ less 1/16″: 13-7/16 × 20-15/16″ (common practice, no source)', () => {
    // Inside width 14 − 2 × ½ = 13″ between the sides; inside depth 22 − 2 × ¾ = 20½″ between front and back.
    const result = sized(base());
    const bottom = part(result.parts, 'bottom');
    expect(result.box.insideWidth).toBeCloseTo(inches(13), 9);
    expect(result.box.insideDepth).toBeCloseTo(inches(20.5), 9);
    expect(bottom.length).toBeCloseTo(inches(13 + 7 / 16), 9);
    expect(bottom.width).toBeCloseTo(inches(20 + 15 / 16), 9);
    expect(bottom.grain).toBe('any');
  });

  test('an applied bottom covers the outside W × D and the walls stand on it (common practice, no source)', () => {
    const result = sized(base({ bottom: { mount: 'applied', thickness: inches(1 / 2) } }));
    const bottom = part(result.parts, 'bottom');
    expect(bottom.length).toBeCloseTo(inches(14), 9);
    expect(bottom.width).toBeCloseTo(inches(22), 9);
    expect(part(result.parts, 'side').width).toBeCloseTo(inches(5.5), 9);
  });
});

describe('parts, quantities and grain', () => {
  test('every box gives one front, one back, two sides and one bottom, multiplied by the boxes in the schedule', () => {
    const { parts } = sized(base({ quantity: 4 }));
    expect(parts.map((p) => [p.role, p.quantityPerBox, p.quantity])).toEqual([
      ['front', 1, 4],
      ['back', 1, 4],
      ['side', 2, 8],
      ['bottom', 1, 4],
    ]);
    expect(parts.every((p) => p.schedule === 'Test bank')).toBe(true);
    expect(parts.filter((p) => p.role !== 'bottom').every((p) => p.grain === 'along-length')).toBe(true);
  });

  test('an inset applied front is the opening less a reveal on each edge', () => {
    const result = sized(
      base({ size: { from: 'opening', width: 400, height: 150, depth: 560 }, front: { style: 'applied', fit: 'inset', reveal: 1.5 } }),
    );
    const front = part(result.parts, 'applied-front');
    expect(front.length).toBeCloseTo(397, 9);
    expect(front.width).toBeCloseTo(147, 9);
  });

  test('materials default from the sides to the front and from the front to the back', () => {
    const { parts } = sized(base({ materials: { sides: 'Birch ply 12', front: 'Maple 19' } }));
    expect(part(parts, 'side').material).toBe('Birch ply 12');
    expect(part(parts, 'front').material).toBe('Maple 19');
    expect(part(parts, 'back').material).toBe('Maple 19');
  });

  test('the schedule lists the setup cards its joint needs', () => {
    expect(sized(base()).setupCardKeys).toEqual([
      { joint: 'lock-rabbet', stockThickness: inches(1 / 2) },
      { joint: 'lock-rabbet', stockThickness: inches(3 / 4) },
    ]);
  });
});

describe('a box that cannot be built gives an error on the field, never parts', () => {
  test.each([
    {
      label: 'lock rabbet engagement equal to the thickness (no face left)',
      over: { joint: { method: 'lock-rabbet', faceLeft: 0 } },
      path: 'joint.faceLeft',
    },
    {
      label: 'lock rabbet face left thicker than the front',
      over: { joint: { method: 'lock-rabbet', faceLeft: inches(1) } },
      path: 'joint.faceLeft',
    },
    {
      label: 'a dado as deep as the side is thick',
      over: { joint: { method: 'rabbet-and-dado', dadoDepth: inches(1 / 2) } },
      path: 'joint.dadoDepth',
    },
    {
      label: 'a half-blind lap as thick as the front',
      over: { joint: { method: 'half-blind-dovetail', lap: inches(3 / 4) } },
      path: 'joint.lap',
    },
    {
      label: 'a face mortise through the side',
      over: { joint: { method: 'butt-loose-tenon', mortiseDepth: inches(1 / 2) } },
      path: 'joint.mortiseDepth',
    },
    { label: 'a bottom thicker than its groove is wide', over: { bottom: { mount: 'groove', thickness: 9 } }, path: 'bottom.thickness' },
    { label: 'a negative bottom clearance', over: { bottom: { mount: 'groove', groove: { clearance: -1 } } }, path: 'bottom.groove.clearance' },
    { label: 'a groove through the side', over: { bottom: { mount: 'groove', groove: { depth: inches(1 / 2) } } }, path: 'bottom.groove.depth' },
    {
      label: 'a box narrower than its two sides',
      over: { size: { from: 'box', width: 20, height: 100, depth: 400 } },
      path: 'thickness.side',
    },
    {
      label: 'an opening narrower than the slides take',
      over: { size: { from: 'opening', width: 20, height: 100, depth: 500 } },
      path: 'size.width',
    },
    {
      label: 'an opening too shallow for any standard slide',
      over: { size: { from: 'opening', width: 400, height: 100, depth: 200 } },
      path: 'size.depth',
    },
    { label: 'a negative slide clearance', over: { slide: { type: 'side-mount', sideClearance: -2 } }, path: 'slide.sideClearance' },
    {
      label: 'a lip on a through-dovetailed front',
      over: { joint: { method: 'through-dovetail' }, front: { style: 'lipped' } },
      path: 'front.style',
    },
    {
      label: 'an applied bottom under undermount slides',
      over: { slide: { type: 'undermount' }, bottom: { mount: 'applied' } },
      path: 'bottom.mount',
    },
    {
      label: 'a bottom below the undermount recess',
      over: { slide: { type: 'undermount' }, bottom: { mount: 'groove', groove: { height: 6 } } },
      path: 'bottom.groove.height',
    },
    { label: 'an applied front with neither opening nor size', over: { front: { style: 'applied' } }, path: 'front.width' },
    { label: 'no boxes', over: { quantity: 0 }, path: 'quantity' },
    { label: 'part of a box', over: { quantity: 1.5 }, path: 'quantity' },
    { label: 'no label', over: { label: '  ' }, path: 'label' },
    { label: 'an unknown joint', over: { joint: { method: 'nails' } }, path: 'joint.method' },
  ])('$label → $path', ({ over, path }) => {
    const result = sizeDrawerSchedule({ ...base(), ...over });
    expect(result.ok).toBe(false);
    expect(result).not.toHaveProperty('parts');
    if (result.ok) return;
    expect(result.errors.map((e) => e.path)).toContain(path);
    expect(result.errors.every((e) => e.message.length > 10)).toBe(true);
  });
});

describe('machining notes and schedule notes', () => {
  test('every wall is told its joint at both ends and where the bottom groove runs', () => {
    const { parts } = sized(base({ joint: { method: 'rabbet-and-dado' } }));
    const side = part(parts, 'side').machining.join(' ');
    // ¾″ front with a ¼″ tongue: the dado's near edge is ½″ (12.7 mm) from the end, so the front's face is flush.
    expect(side).toContain('Dado 6.4 mm wide × 6.4 mm deep across the inside face at both ends, its near edge 12.7 mm from the front end');
    expect(side).toContain('its lower edge 12.7 mm above the bottom edge');
    expect(part(parts, 'front').machining.join(' ')).toContain('Rabbet on the outside face of both ends');
  });

  test('loose tenons are counted for the whole schedule, since they are cut from their own stock', () => {
    const result = sized(base({ quantity: 3, joint: { method: 'butt-loose-tenon', tenonsPerCorner: 2 } }));
    expect(result.notes.join(' ')).toContain('24 loose tenons');
  });

  test('undermount slides with sides thicker than ⅝″ warn to check the maker’s spec', () => {
    const result = sized(base({ slide: { type: 'undermount' }, thickness: { front: 19, side: 19 } }));
    expect(result.notes.join(' ')).toContain("check the maker's spec for 19 mm sides");
  });
});

import { describe, expect, test } from 'vitest';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { DEFAULT_RECUT_REASON, finishFigures, recutLabel, recutNestParts, type RecutPart } from './recuts';

const side: RecutPart = {
  id: '5d1f7b0e-4a8e-4f43-9d3f-0c6f3b1d2a11',
  label: 'Base side',
  instance: 3,
  quantity: 1,
  length: 876.3,
  width: 584.2,
  thickness: 18.26,
  material: 'Maple ply',
  grain: 'along-length',
  jointAllowance: 0,
  reason: 'Tear-out',
};

describe('re-cuts as parts of a Nest', () => {
  test('keep the re-cut id, the part label with "#n", the size, material, thickness and grain', () => {
    const [part] = recutNestParts([side]);
    expect(part).toMatchObject({
      id: side.id,
      label: 'Base side #3 · re-cut',
      quantity: 1,
      length: 876.3,
      width: 584.2,
      thickness: 18.26,
      material: 'Maple ply',
      grain: 'along-length',
      notes: 'Re-cut: Tear-out',
    });
    expect(nestRequestSchema.safeParse({ parts: [part], stock: [] }).success).toBe(true);
  });

  test('a re-cut without a reason says it was damaged at the saw, and one without a label is still named', () => {
    expect(recutNestParts([{ ...side, reason: '' }])[0].notes).toBe(`Re-cut: ${DEFAULT_RECUT_REASON}`);
    expect(recutLabel({ label: '', instance: 2 })).toBe('Part #2');
  });
});

describe('figures of a finished plan with a spoiled part', () => {
  // Worked by hand: a 2440 × 1220 sheet (2,976,800 mm²), parts 2,400,000 mm², 300,000 kept as offcuts, one 600 × 500
  // part (300,000 mm²) damaged. Good parts 2,100,000 → yield 70.55 %; waste 2,976,800 − 2,100,000 − 300,000 = 576,800
  // → 19.38 %, of which spoiled 300,000 → 10.08 % and saw waste 276,800 → 9.30 %.
  test('the spoiled area leaves the yield and counts as waste, shown apart from the saw waste', () => {
    const f = finishFigures({ stockArea: 2440 * 1220, partArea: 2_400_000, keptOffcutArea: 300_000, spoiledArea: 600 * 500 });
    expect(f.yieldRatio).toBeCloseTo(2_100_000 / 2_976_800, 12);
    expect(f.wasteRatio).toBeCloseTo(576_800 / 2_976_800, 12);
    expect(f.spoiledRatio).toBeCloseTo(300_000 / 2_976_800, 12);
    expect(f.sawWasteRatio).toBeCloseTo(276_800 / 2_976_800, 12);
    expect(f.yieldRatio + f.wasteRatio + 300_000 / 2_976_800).toBeCloseTo(1, 12);
  });

  test('nothing damaged: the yield is the parts, and no stock means no figures rather than NaN', () => {
    expect(finishFigures({ stockArea: 1000, partArea: 800, keptOffcutArea: 100, spoiledArea: 0 })).toEqual({
      yieldRatio: 0.8,
      wasteRatio: 0.1,
      spoiledRatio: 0,
      sawWasteRatio: 0.1,
    });
    expect(finishFigures({ stockArea: 0, partArea: 0, keptOffcutArea: 0, spoiledArea: 0 })).toEqual({
      yieldRatio: 0,
      wasteRatio: 0,
      spoiledRatio: 0,
      sawWasteRatio: 0,
    });
  });
});

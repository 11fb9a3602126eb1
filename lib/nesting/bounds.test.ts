import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { continuousBound, dellAmicoMartelloVigo, lowerBound, martelloVigoL2, rotationBound, type Size } from './bounds';
import { maxRectsLayout } from './bounds/maxrects-reference';
import { parseInstances, type BinPackingInstance } from './instances';

const INSTANCE_FILE = path.resolve(import.meta.dirname, '../../bench/data/2bp-classes-I-X.txt');
const CLASSES = ['I', 'II', 'III', 'IV', 'V', 'VI', 'VII', 'VIII', 'IX', 'X'];

function loadStandardInstances(): BinPackingInstance[] {
  // CI has the file: a missing file must fail the suite, never skip it.
  expect(existsSync(INSTANCE_FILE), `standard instance file missing at ${INSTANCE_FILE}`).toBe(true);
  return parseInstances(readFileSync(INSTANCE_FILE, 'utf8'));
}

function totalsPerClass(instances: BinPackingInstance[], bound: (i: BinPackingInstance) => number): number[] {
  const totals = CLASSES.map(() => 0);
  for (const inst of instances) totals[(inst.cls ?? 0) - 1] += bound(inst);
  return totals;
}

const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);

/** Bins of a feasible layout from a general-purpose packer (checked inside `maxRectsLayout`). */
const binsUsedByMaxRects = (items: Size[], bin: Size, rotation: boolean) => maxRectsLayout(items, bin, rotation).length;

describe('the 500 standard instances (classes I–X, bench/data/README.md)', () => {
  const instances = loadStandardInstances();

  test('the file holds 500 instances, 50 per class', () => {
    expect(instances).toHaveLength(500);
    expect(totalsPerClass(instances, () => 1)).toEqual(CLASSES.map(() => 50));
  });

  test('continuous bound L0 totals 5,980 (reference total in the README, from ⌈Σ area / bin area⌉)', () => {
    expect(sum(totalsPerClass(instances, (i) => continuousBound(i.items, i.bin)))).toBe(5980);
  });

  test('Martello & Vigo (Management Science 44(3), 1998) L2 with fixed orientation totals 7,064 with the published per-class split', () => {
    const totals = totalsPerClass(instances, (i) => martelloVigoL2(i.items, i.bin));
    expect(totals).toEqual([971, 124, 668, 119, 855, 108, 807, 820, 2108, 484]);
    expect(sum(totals)).toBe(7064);
  });

  test("Dell'Amico, Martello & Vigo (Discrete Applied Mathematics 118, 2002) with rotation totals 6,769 with the published per-class split", () => {
    const totals = totalsPerClass(instances, (i) => dellAmicoMartelloVigo(i.items, i.bin));
    expect(totals).toEqual([936, 124, 642, 119, 821, 108, 719, 721, 2103, 476]);
    expect(sum(totals)).toBe(6769);
  });

  test("our whole-item rotation bound is never below Dell'Amico, Martello & Vigo on any instance, and lowerBound takes the larger", () => {
    for (const inst of instances) {
      const dmv = dellAmicoMartelloVigo(inst.items, inst.bin);
      expect(rotationBound(inst.items, inst.bin), inst.name).toBeGreaterThanOrEqual(dmv);
      expect(lowerBound(inst.items, inst.bin, true)).toBe(Math.max(dmv, rotationBound(inst.items, inst.bin)));
      expect(lowerBound(inst.items, inst.bin, false)).toBeGreaterThanOrEqual(martelloVigoL2(inst.items, inst.bin));
    }
  });

  test('no bound exceeds the bins of a checked maxrects-packer layout on any of the 500 instances, fixed or turned', () => {
    for (const inst of instances) {
      for (const rotation of [false, true]) {
        expect(lowerBound(inst.items, inst.bin, rotation), `${inst.name} rotation=${rotation}`).toBeLessThanOrEqual(
          binsUsedByMaxRects(inst.items, inst.bin, rotation),
        );
      }
    }
  });
});

describe('worked examples', () => {
  const bin = { w: 10, h: 10 };
  test.each([
    {
      label: '[derived] L0: 3 × (6 × 6) = 108 of a 100-unit bin → 2',
      items: [
        [6, 6],
        [6, 6],
        [6, 6],
      ],
      rotation: false,
      l0: 2,
      bound: 3,
    },
    {
      label: '[derived] items wider and taller than half the bin never share one, turned or not → 3',
      items: [
        [6, 6],
        [6, 6],
        [6, 6],
      ],
      rotation: true,
      l0: 2,
      bound: 3,
    },
    {
      label: '[derived] four 6 × 4 fixed: only two stack in 10 (4 + 4 ≤ 10 < 12), none side by side (6 + 6 > 10) → 2',
      items: [
        [6, 4],
        [6, 4],
        [6, 4],
        [6, 4],
      ],
      rotation: false,
      l0: 1,
      bound: 2,
    },
    {
      label: '[derived] the same four 6 × 4 turned freely fit one bin as a pinwheel round a 2 × 2 hole, so the bound must stay 1',
      items: [
        [6, 4],
        [6, 4],
        [6, 4],
        [6, 4],
      ],
      rotation: true,
      l0: 1,
      bound: 1,
    },
    {
      label: '[derived] a 9 × 9 item leaves only 1-wide strips, so a 2 × 2 cannot join it (area 85 → L0 1) → 2',
      items: [
        [9, 9],
        [2, 2],
      ],
      rotation: true,
      l0: 1,
      bound: 2,
    },
    {
      label: '[derived] a 6 × 6 and a 5 × 5 (area 61 → L0 1) cannot share a bin either way round: 6 + 5 > 10 across and along → 2',
      items: [
        [6, 6],
        [5, 5],
      ],
      rotation: true,
      l0: 1,
      bound: 2,
    },
    {
      label: '[derived] two 9 × 9 and one 5 × 5 (area 187 → L0 2): the 5 × 5 fits beside neither → 3',
      items: [
        [9, 9],
        [9, 9],
        [5, 5],
      ],
      rotation: true,
      l0: 2,
      bound: 3,
    },
  ])('$label', ({ items, rotation, l0, bound }) => {
    const sizes = items.map(([w, h]) => ({ w, h }));
    expect(continuousBound(sizes, bin)).toBe(l0);
    expect(lowerBound(sizes, bin, rotation)).toBe(bound);
  });

  test("[derived] a 6 × 6 and three 5 × 9 turned freely: the 6 × 6 fits beside none of them (6 + 5 > 10 both ways) and only two 5 × 9 share a bin, so 3 bins; cut into squares (Dell'Amico, Martello & Vigo) the 5 × 9 keep only a 5 × 5 of side ≥ 5 and give 2", () => {
    const sizes = [{ w: 6, h: 6 }, ...Array.from({ length: 3 }, () => ({ w: 5, h: 9 }))];
    expect(continuousBound(sizes, bin)).toBe(2);
    expect(dellAmicoMartelloVigo(sizes, bin)).toBe(2);
    expect(rotationBound(sizes, bin)).toBe(3);
    expect(lowerBound(sizes, bin, true)).toBe(3);
  });

  test('[derived] with fixed orientation a 6 × 6 and a 5 × 5 cannot share a 10 × 10 bin: L2 of Martello & Vigo gives 1, lowerBound 2 from the rotation argument, which holds a fortiori', () => {
    const sizes = [
      { w: 6, h: 6 },
      { w: 5, h: 5 },
    ];
    expect(martelloVigoL2(sizes, bin)).toBe(1);
    expect(lowerBound(sizes, bin, false)).toBe(2);
  });

  test('Martello & Vigo L2 exceeds L0 when wide items waste the room beside them ([derived]: five 6 × 3 stack three to a bin → 2, area 90 → L0 1)', () => {
    const sizes = Array.from({ length: 5 }, () => ({ w: 6, h: 3 }));
    expect(continuousBound(sizes, bin)).toBe(1);
    expect(martelloVigoL2(sizes, bin)).toBe(2);
  });

  test.each([
    {
      label:
        '[derived] two 1300 × 700 parts on a 2440 × 1220 sheet: 2600 > 2440 side by side, 1400 > 1220 stacked, and turned they do not fit → 2 sheets',
      items: [
        [1300, 700],
        [1300, 700],
      ],
      rotation: true,
      bound: 2,
    },
    {
      label: '[derived] the same two parts with grain locked → 2 sheets',
      items: [
        [1300, 700],
        [1300, 700],
      ],
      rotation: false,
      bound: 2,
    },
    {
      label: '[derived] two 1200 × 700 parts stand side by side (2400 ≤ 2440) → 1 sheet',
      items: [
        [1200, 700],
        [1200, 700],
      ],
      rotation: true,
      bound: 1,
    },
  ])('$label', ({ items, rotation, bound }) => {
    expect(
      lowerBound(
        items.map(([w, h]) => ({ w, h })),
        { w: 2440, h: 1220 },
        rotation,
      ),
    ).toBe(bound);
  });

  test('an empty list needs no bins', () => {
    expect(lowerBound([], bin, false)).toBe(0);
    expect(lowerBound([], bin, true)).toBe(0);
  });
});

describe('bad input is refused with a clear error', () => {
  const square = { w: 10, h: 10 };
  const long = { w: 10, h: 20 };
  test.each([
    {
      label: 'an item longer than the bin',
      items: [{ w: 11, h: 2 }],
      bin: square,
      rotation: false,
      message: /item 0 \(11 × 2\) does not fit the 10 × 10 bin/,
    },
    {
      label: 'an item that fits only turned, when turning is not allowed',
      items: [{ w: 12, h: 4 }],
      bin: long,
      rotation: false,
      message: /does not fit the 10 × 20 bin$/,
    },
    {
      label: 'an item too big either way round',
      items: [
        { w: 1, h: 1 },
        { w: 21, h: 4 },
      ],
      bin: long,
      rotation: true,
      message: /item 1 \(21 × 4\) does not fit the 10 × 20 bin either way round/,
    },
    { label: 'a zero size', items: [{ w: 0, h: 2 }], bin: square, rotation: true, message: /item 0 size must be positive/ },
    { label: 'a NaN size', items: [{ w: Number.NaN, h: 2 }], bin: square, rotation: true, message: /item 0 size must be positive/ },
  ])('$label', ({ items, bin, rotation, message }) => {
    expect(() => lowerBound(items, bin, rotation)).toThrow(message);
  });

  test('a non-positive bin', () => {
    expect(() => lowerBound([{ w: 1, h: 1 }], { w: 0, h: 10 }, false)).toThrow(/bin size must be positive/);
  });

  test('an item that fits a long bin only turned is accepted with rotation', () => {
    expect(lowerBound([{ w: 12, h: 4 }], { w: 10, h: 20 }, true)).toBe(1);
  });
});

describe('properties', () => {
  const sizeIn = (bin: Size) => fc.record({ w: fc.integer({ min: 1, max: bin.w }), h: fc.integer({ min: 1, max: bin.h }) });
  const instance = fc
    .record({ w: fc.integer({ min: 2, max: 40 }), h: fc.integer({ min: 2, max: 40 }) })
    .chain((bin) => fc.record({ bin: fc.constant(bin), items: fc.array(sizeIn(bin), { minLength: 1, maxLength: 30 }) }));

  test('no bound exceeds the bins of a feasible layout (maxrects-packer, checked), fixed or turned', () => {
    fc.assert(
      fc.property(instance, fc.boolean(), ({ bin, items }, rotation) => {
        expect(lowerBound(items, bin, rotation)).toBeLessThanOrEqual(binsUsedByMaxRects(items, bin, rotation));
      }),
      { numRuns: 200 },
    );
  });

  test("on square bins the whole-item rotation bound is never below the squares bound of Dell'Amico, Martello & Vigo", () => {
    fc.assert(
      fc.property(instance, ({ bin, items }) => {
        const side = Math.min(bin.w, bin.h);
        const square = { w: side, h: side };
        const fitting = items.filter((it) => it.w <= side && it.h <= side);
        expect(rotationBound(fitting, square)).toBeGreaterThanOrEqual(dellAmicoMartelloVigo(fitting, square));
      }),
    );
  });

  test('every bound is at least the continuous bound', () => {
    fc.assert(
      fc.property(instance, fc.boolean(), ({ bin, items }, rotation) => {
        expect(lowerBound(items, bin, rotation)).toBeGreaterThanOrEqual(continuousBound(items, bin));
      }),
    );
  });

  test('the fixed-orientation bound does not change when the whole instance is turned a quarter', () => {
    fc.assert(
      fc.property(instance, ({ bin, items }) => {
        const turned = items.map((it) => ({ w: it.h, h: it.w }));
        expect(lowerBound(turned, { w: bin.h, h: bin.w }, false)).toBe(lowerBound(items, bin, false));
      }),
    );
  });

  test('the rotation bound does not depend on which way round each item is listed', () => {
    fc.assert(
      fc.property(instance, fc.array(fc.boolean(), { minLength: 30, maxLength: 30 }), ({ bin, items }, flips) => {
        const listed = items.map((it, k) => (flips[k] ? { w: it.h, h: it.w } : it));
        expect(lowerBound(listed, bin, true)).toBe(lowerBound(items, bin, true));
      }),
    );
  });

  test('sizes scaled by a common factor keep every bound (a bound is about shapes, not units)', () => {
    fc.assert(
      fc.property(instance, fc.constantFrom(2, 3, 25.4), fc.boolean(), ({ bin, items }, k, rotation) => {
        const scaled = items.map((it) => ({ w: it.w * k, h: it.h * k }));
        expect(lowerBound(scaled, { w: bin.w * k, h: bin.h * k }, rotation)).toBe(lowerBound(items, bin, rotation));
      }),
    );
  });
});

import { describe, expect, test } from 'vitest';
import type { TakeoffLine } from '@/lib/stock/takeoff';
import { DEFAULT_PRICING } from '@/shared/schemas/pricing';
import { quoteNumberText, revisionLetter } from '@/shared/schemas/quote';
import { buildQuoteLines, slidePrice } from './build-lines';

const sheet = (over: Partial<TakeoffLine>): TakeoffLine => ({
  stockId: 's1',
  source: 'stock',
  kind: 'sheet',
  material: 'Maple ply',
  nominalThickness: '3/4',
  thickness: 18.3,
  length: 2438.4,
  width: 1219.2,
  count: 3,
  costEachCents: 6840,
  free: 10,
  heldByPlan: 0,
  boardFeet: null,
  areaMm2: 3 * 2438.4 * 1219.2,
  costCents: 3 * 6840,
  covered: true,
  ...over,
});
const HARDWARE = [
  { id: 'h1', name: 'Side-mount slides, 18″, full extension', unit: 'pair', priceMinor: 1495 },
  { id: 'h2', name: 'Side-mount slides, 20″, full extension', unit: 'pair', priceMinor: 1650 },
  { id: 'h3', name: 'Pull, 18″ bar', unit: 'each', priceMinor: 900 },
];
const counts = { cuts: 46, piecesHandled: 9, setupCards: 2, jointCorners: 16, drawerBoxes: 4, faceAreaMm2: 6_437_000 };
const base = { counts, hardware: HARDWARE, describeSize: (t: TakeoffLine) => t.material };

describe('a new quote’s lines (the Alder & Finch figures of lib/costing/RULES.md, checked by hand)', () => {
  test('material at cost, offcuts at area cost or free, the allowance once, slides as pairs priced from the list, labour hours', () => {
    const src = {
      ...base,
      takeoff: {
        lines: [sheet({}), sheet({ stockId: 'o1', source: 'offcut', kind: 'offcut', count: 1, costEachCents: 937 })],
        allowancePercent: 15,
        allowanceCents: 3219,
      },
      slides: [
        { kind: 'Side-mount slides', length: 457.2, lengthText: '18″', pairs: 4 },
        { kind: 'Side-mount slides', length: 558.8, lengthText: '22″', pairs: 2 },
      ],
      pricing: { ...DEFAULT_PRICING, finishingMinutesPerM2: 9 },
    };
    const lines = buildQuoteLines(src);
    expect(lines.map((l) => [l.kind, l.quantity, l.unitCostMinor])).toEqual([
      ['material', 3, 6840],
      ['material', 1, 937],
      ['material', 1, 3219],
      ['hardware', 4, 1495],
      ['hardware', 2, 0],
      ['labour', 0.95, 6500],
      ['labour', 1.07, 7200],
      ['labour', 0.8, 5500],
      ['labour', 0.97, 4800],
    ]);
    expect(lines[4].note).toMatch(/No 22″ slides on the price list/);
    expect(lines[8].description).toBe('Finishing: 6.44 m² of faces');
    expect(new Set(lines.map((l) => l.id)).size).toBe(lines.length);
    const free = buildQuoteLines({ ...src, pricing: { ...src.pricing, offcutValuation: 'free' } });
    expect(free[1].unitCostMinor).toBe(0);
  });

  test('a slide is matched by its length and a pair unit, never by another item that names the length', () => {
    expect(slidePrice({ kind: 'Side-mount slides', length: 457.2, lengthText: '18″', pairs: 1 }, HARDWARE)?.id).toBe('h1');
    expect(slidePrice({ kind: 'Side-mount slides', length: 457.2, lengthText: '18″', pairs: 1 }, [HARDWARE[2]])).toBeUndefined();
  });

  test('quote numbers and revision letters', () => {
    expect(quoteNumberText(7)).toBe('Q-0007');
    expect([0, 1, 25, 26, 27].map(revisionLetter)).toEqual(['A', 'B', 'Z', 'AA', 'AB']);
    expect(() => revisionLetter(-1)).toThrow(RangeError);
  });
});

import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { snapThickness, stockMatchWarning, thicknessChoices, type StockOffer } from './stock-match';
import { cutListTotals } from './totals';

const OFFERS: StockOffer[] = [
  { material: 'White oak', kind: 'board', thickness: inches(13 / 16), nominal: '4/4' },
  { material: 'Maple ply', kind: 'sheet', thickness: inches(23 / 32), nominal: '3/4"' },
  { material: 'Maple ply', kind: 'offcut', thickness: 6, nominal: '' },
  { material: 'MDF', kind: 'sheet', thickness: 18, nominal: '3/4"' },
];
const UNITS = { system: 'imperial', precision: 16, feet: false } as const;

describe('cut list totals', () => {
  test('a 1″ × 12″ × 12″ solid piece is one board foot (AHEC, "Measurement": 144 in³)', () => {
    const t = cutListTotals([{ quantity: 1, length: inches(12), width: inches(12), thickness: inches(1), material: 'white oak' }], OFFERS);
    expect(t.boardFeet).toBeCloseTo(1, 12);
    expect(t.solidPieces).toBe(1);
  });

  test('pieces and area count every quantity; sheet parts add no board feet', () => {
    const t = cutListTotals(
      [
        { quantity: 4, length: 1000, width: 500, thickness: 18, material: 'Maple ply' },
        { quantity: 2, length: inches(24), width: inches(6), thickness: inches(1), material: 'White oak' },
      ],
      OFFERS,
    );
    expect(t).toMatchObject({ pieces: 6, rows: 2, solidPieces: 2 });
    expect(t.areaMm2).toBeCloseTo(4 * 1000 * 500 + 2 * inches(24) * inches(6), 6);
    expect(t.boardFeet).toBeCloseTo((2 * (1 * 6 * 2)) / 12, 12); // T(in) × W(in) × L(ft) / 12 per piece
  });
});

describe('matching a part to the stock room', () => {
  test.each([
    ['Maple ply', inches(23 / 32), null],
    ['maple PLY', inches(23 / 32) + 0.005, null],
    ['Maple ply', 6, null],
    ['Maple ply', inches(3 / 4), 'The stock room has no Maple ply 3/4″ thick. It has: offcuts · 6 mm; 3/4″ sheet · 23/32″ actual.'],
    ['Maple ply', 12, 'The stock room has no Maple ply 12 mm thick. It has: offcuts · 6 mm; 3/4″ sheet · 23/32″ actual.'],
    ['Walnut', 19, 'The stock room has no Walnut at all'],
  ] as const)('%s at %f mm → %s (the nesting engine’s 0.01 mm match)', (material, thickness, warning) => {
    const result = stockMatchWarning({ material, thickness }, OFFERS, UNITS);
    if (warning === null) expect(result).toBeNull();
    else expect(result).toContain(warning);
  });

  test('the warning never says the stock room has a thickness it says the part is not (a rounded ≈ size)', () => {
    // Stock at 12 mm and a part at ½″ (12.7 mm): both would show as ≈1/2″ to the sixteenth.
    const offers: StockOffer[] = [{ material: 'Baltic birch', kind: 'sheet', thickness: 12, nominal: '1/2"' }];
    const warning = stockMatchWarning({ material: 'Baltic birch', thickness: inches(1 / 2) }, offers, UNITS)!;
    expect(warning).toContain('no Baltic birch 1/2″ thick');
    expect(warning).toContain('1/2″ sheet · 12 mm actual');
    expect(warning).not.toContain('≈');
  });
});

describe('the thicknesses a picker offers', () => {
  test('one choice per actual thickness, thinnest first, named by nominal thickness and kind, with the actual size', () => {
    const offers: StockOffer[] = [
      { material: 'Baltic birch', kind: 'sheet', thickness: 18, nominal: '3/4"' },
      { material: 'Baltic birch', kind: 'sheet', thickness: 12, nominal: '1/2"' },
      { material: 'baltic birch', kind: 'offcut', thickness: 12, nominal: '' },
      { material: 'Baltic birch', kind: 'offcut', thickness: 9, nominal: '' },
      { material: 'Maple ply', kind: 'sheet', thickness: 6, nominal: '1/4"' },
    ];
    expect(thicknessChoices('Baltic birch', offers, UNITS)).toEqual([
      { thickness: 9, text: '9 mm', label: 'offcuts · 9 mm' },
      { thickness: 12, text: '12 mm', label: '1/2″ sheet · 12 mm actual' },
      { thickness: 18, text: '18 mm', label: '3/4″ sheet · 18 mm actual' },
    ]);
    // 23/32″ is on the 1/32″ grid, so an imperial shop reads it as a fraction (common practice, no source).
    expect(thicknessChoices('Maple ply', OFFERS, UNITS).map((c) => c.text)).toEqual(['6 mm', '23/32″']);
    expect(thicknessChoices('Walnut', offers, UNITS)).toEqual([]);
  });
});

describe('a typed thickness snaps to the stock it means', () => {
  test.each([
    ['3/4″ Maple ply is the 23/32″ sheet sold as 3/4″', 'Maple ply', inches(3 / 4), inches(23 / 32)],
    ['3/4″ MDF is the 18 mm sheet sold as 3/4″', 'MDF', inches(3 / 4), 18],
    ['18 mm Maple ply is the 23/32″ (18.26 mm) sheet', 'Maple ply', 18, inches(23 / 32)],
    ['4/4 white oak is the 13/16″ surfaced board', 'White oak', inches(1), inches(13 / 16)],
    ['1/2″ Maple ply has no near stock and stays', 'Maple ply', inches(1 / 2), inches(1 / 2)],
    ['a material not in stock stays', 'Walnut', 19, 19],
  ])('%s (common practice, no source)', (_what, material, typed, expected) => {
    expect(snapThickness(material, typed, OFFERS)).toBeCloseTo(expected, 9);
  });
});

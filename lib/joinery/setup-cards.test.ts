import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { setupCardSchema } from '@/shared/schemas/setup-card';
import { DEFAULT_LOCK_RABBET_CARDS, defaultSetupCard, findSetupCard, requiredSetupCards } from '@/lib/joinery/setup-cards';

const schedule = (over: object) =>
  drawerScheduleSchema.parse({ label: 'S', quantity: 1, size: { from: 'box', widthMm: 400, heightMm: 150, depthMm: 500 }, ...over });
const field = (stockIn: number, key: string) =>
  DEFAULT_LOCK_RABBET_CARDS.find((c) => Math.abs(c.stockThicknessMm - inches(stockIn)) < 1e-9)!.fields.find((f) => f.key === key)!.value;

describe('default lock-rabbet setup cards (common practice, no source)', () => {
  test('the bit height stays ⅜″ for every stock thickness', () => {
    expect(field(1 / 2, 'bit-height')).toBeCloseTo(inches(3 / 8), 9);
    expect(field(3 / 4, 'bit-height')).toBeCloseTo(inches(3 / 8), 9);
  });

  test.each([
    { label: '¾″ stock: fence 7/16″ back from the cutter’s front (common practice, no source)', stockIn: 3 / 4, setbackIn: 7 / 16 },
    { label: '½″ stock: fence 5/16″ back from the cutter’s front (common practice, no source)', stockIn: 1 / 2, setbackIn: 5 / 16 },
  ])('$label', ({ stockIn, setbackIn }) => {
    expect(field(stockIn, 'fence-setback')).toBeCloseTo(inches(setbackIn), 9);
  });

  test('every default card is a valid setup card', () => {
    for (const card of DEFAULT_LOCK_RABBET_CARDS) expect(setupCardSchema.parse(card)).toEqual(card);
  });
});

describe('which setup cards a schedule needs', () => {
  test('a ¾″ front with ½″ sides needs a card for each thickness, thinnest first', () => {
    expect(requiredSetupCards(schedule({ thickness: { frontMm: inches(3 / 4), sideMm: inches(1 / 2) } }))).toEqual([
      { joint: 'lock-rabbet', stockThicknessMm: inches(1 / 2) },
      { joint: 'lock-rabbet', stockThicknessMm: inches(3 / 4) },
    ]);
  });

  test('one stock thickness all round needs one card, for the schedule’s joint', () => {
    expect(requiredSetupCards(schedule({ joint: { method: 'box-joint' }, thickness: { frontMm: 12, sideMm: 12 } }))).toEqual([
      { joint: 'box-joint', stockThicknessMm: 12 },
    ]);
  });

  test('a back thinner than the front adds its own card', () => {
    expect(requiredSetupCards(schedule({ thickness: { frontMm: 19, backMm: 15, sideMm: 12 } })).map((k) => k.stockThicknessMm)).toEqual([12, 15, 19]);
  });

  test('a saved card is found for stock within the tolerance, and not for another joint', () => {
    const cards = [...DEFAULT_LOCK_RABBET_CARDS];
    expect(findSetupCard(cards, { joint: 'lock-rabbet', stockThicknessMm: 12.75 })?.stockThicknessMm).toBeCloseTo(inches(1 / 2), 9);
    expect(findSetupCard(cards, { joint: 'lock-rabbet', stockThicknessMm: 15 })).toBeUndefined();
    expect(findSetupCard(cards, { joint: 'box-joint', stockThicknessMm: inches(1 / 2) })).toBeUndefined();
  });
});

describe('the default card for stock the shop has no card for', () => {
  test('12 mm stock starts from the ½″ card and 18 mm from the ¾″ one, shown at the actual thickness (common practice, no source)', () => {
    const twelve = defaultSetupCard({ joint: 'lock-rabbet', stockThicknessMm: 12 })!;
    expect(twelve.stockThicknessMm).toBe(12);
    expect(twelve.fields.find((f) => f.key === 'fence-setback')!.value).toBeCloseTo(inches(5 / 16), 9);
    expect(defaultSetupCard({ joint: 'lock-rabbet', stockThicknessMm: 18 })!.fields.find((f) => f.key === 'fence-setback')!.value).toBeCloseTo(inches(7 / 16), 9);
  });

  test('stock far from every default, or another joint, has no default card', () => {
    expect(defaultSetupCard({ joint: 'lock-rabbet', stockThicknessMm: 15.5 })).toBeUndefined();
    expect(defaultSetupCard({ joint: 'box-joint', stockThicknessMm: 12 })).toBeUndefined();
  });
});

describe('setup card schema', () => {
  test('rejects a card with no stock thickness, naming the field', () => {
    const result = setupCardSchema.safeParse({ joint: 'lock-rabbet', stockThicknessMm: 0, fields: [] });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].path).toEqual(['stockThicknessMm']);
  });

  test('fills an empty note', () => {
    expect(setupCardSchema.parse({ joint: 'through-dovetail', stockThicknessMm: 19, fields: [] }).note).toBe('');
  });
});

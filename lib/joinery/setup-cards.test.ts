import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { setupCardSchema } from '@/shared/schemas/setup-card';
import { DEFAULT_LOCK_RABBET_CARDS, defaultSetupCard, findSetupCard, lockRabbetCard, requiredSetupCards } from '@/lib/joinery/setup-cards';

const schedule = (over: object) =>
  drawerScheduleSchema.parse({ label: 'S', quantity: 1, size: { from: 'box', width: 400, height: 150, depth: 500 }, ...over });
const field = (stockIn: number, key: string) =>
  DEFAULT_LOCK_RABBET_CARDS.find((c) => Math.abs(c.stockThickness - inches(stockIn)) < 1e-9)!.fields.find((f) => f.key === key)!.value;

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
    expect(requiredSetupCards(schedule({ thickness: { front: inches(3 / 4), side: inches(1 / 2) } }))).toEqual([
      { joint: 'lock-rabbet', stockThickness: inches(1 / 2) },
      { joint: 'lock-rabbet', stockThickness: inches(3 / 4) },
    ]);
  });

  test('one stock thickness all round needs one card, for the schedule’s joint', () => {
    expect(requiredSetupCards(schedule({ joint: { method: 'box-joint' }, thickness: { front: 12, side: 12 } }))).toEqual([
      { joint: 'box-joint', stockThickness: 12 },
    ]);
  });

  test('a back thinner than the front adds its own card', () => {
    expect(requiredSetupCards(schedule({ thickness: { front: 19, back: 15, side: 12 } })).map((k) => k.stockThickness)).toEqual([12, 15, 19]);
  });

  test('a saved card is found for stock within the tolerance, and not for another joint', () => {
    const cards = [lockRabbetCard(inches(1 / 2)), lockRabbetCard(inches(3 / 4))];
    expect(findSetupCard(cards, { joint: 'lock-rabbet', stockThickness: 12.75 })?.stockThickness).toBeCloseTo(inches(1 / 2), 9);
    expect(findSetupCard(cards, { joint: 'lock-rabbet', stockThickness: 15 })).toBeUndefined();
    expect(findSetupCard(cards, { joint: 'box-joint', stockThickness: inches(1 / 2) })).toBeUndefined();
  });
});

describe('the default card for stock the shop has no card for', () => {
  test.each([
    ['½″ stock: 5/16″ back (common practice, no source)', inches(1 / 2), inches(5 / 16)],
    ['¾″ stock: 7/16″ back (common practice, no source)', inches(3 / 4), inches(7 / 16)],
    ['12 mm stock: 6 + 1.5875 = 7.5875 mm back, by the same rule (derived)', 12, 7.5875],
    ['15 mm stock: 7.5 + 1.5875 = 9.0875 mm back (derived)', 15, 9.0875],
  ])('the starting card for %s', (_label, stock, setback) => {
    const card = defaultSetupCard({ joint: 'lock-rabbet', stockThickness: stock })!;
    expect(card.stockThickness).toBe(stock);
    expect(card.fields.find((f) => f.key === 'fence-setback')!.value).toBeCloseTo(setback, 9);
    expect(card.fields.find((f) => f.key === 'bit-height')!.value).toBeCloseTo(inches(3 / 8), 9);
    expect(card.note).toMatch(/test cuts in scrap/);
  });

  test('stock no lock rabbet is cut in, or another joint, has no starting card', () => {
    expect(defaultSetupCard({ joint: 'lock-rabbet', stockThickness: 6 })).toBeUndefined();
    expect(defaultSetupCard({ joint: 'lock-rabbet', stockThickness: 40 })).toBeUndefined();
    expect(defaultSetupCard({ joint: 'box-joint', stockThickness: 12 })).toBeUndefined();
  });

  test('the seeded starting cards cover ½″, ⅝″, ¾″ and 12, 15, 18 mm, thinnest first', () => {
    expect(DEFAULT_LOCK_RABBET_CARDS.map((c) => c.stockThickness)).toEqual(
      [12, inches(1 / 2), 15, inches(5 / 8), 18, inches(3 / 4)].sort((a, b) => a - b),
    );
  });
});

describe('setup card schema', () => {
  test('rejects a card with no stock thickness, naming the field', () => {
    const result = setupCardSchema.safeParse({ joint: 'lock-rabbet', stockThickness: 0, fields: [] });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].path).toEqual(['stockThickness']);
  });

  test('fills an empty note', () => {
    expect(setupCardSchema.parse({ joint: 'through-dovetail', stockThickness: 19, fields: [] }).note).toBe('');
  });
});

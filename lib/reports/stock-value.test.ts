import { describe, expect, test } from 'vitest';
import { stockValueOverTime } from './stock-value';

// An invented rack: birch sheets at $68.50 and a maple offcut at $11.00; the ledger worked by hand.
const PIECES = [
  { id: 'birch', material: 'Baltic birch', costEach: 6850 },
  { id: 'offcut', material: 'Maple ply', costEach: 1100 },
];

describe('stock value rebuilt from the ledger (worked by hand)', () => {
  test('movements before the range open it; each period closes on the sum of its movements', () => {
    const { points } = stockValueOverTime(
      ['2026-10-01', '2026-11-01', '2026-12-01'],
      [
        { period: '2026-08-01', pieceId: 'birch', onHand: 10, reserved: 0 }, // opening count: 10 × $68.50 = $685.00
        { period: '2026-11-01', pieceId: 'birch', onHand: 0, reserved: 3 }, // three reserved in November
        { period: '2026-11-01', pieceId: 'offcut', onHand: 1, reserved: 0 }, // an offcut racked
        { period: '2026-12-01', pieceId: 'birch', onHand: -3, reserved: -3 }, // the three cut in December
        { period: '2027-01-01', pieceId: 'birch', onHand: 5, reserved: 0 }, // after the range: ignored
      ],
      PIECES,
    );
    expect(points).toEqual([
      { period: '2026-10-01', onHandCents: 68_500, reservedCents: 0, byMaterial: { 'Baltic birch': 68_500 } },
      { period: '2026-11-01', onHandCents: 68_500 + 1_100, reservedCents: 3 * 6850, byMaterial: { 'Baltic birch': 68_500, 'Maple ply': 1_100 } },
      { period: '2026-12-01', onHandCents: 7 * 6850 + 1_100, reservedCents: 0, byMaterial: { 'Baltic birch': 47_950, 'Maple ply': 1_100 } },
    ]);
  });

  test('a piece the ledger names but the stock room lacks is reported, not valued at zero in silence', () => {
    const { points, unknownPieces } = stockValueOverTime(['2026-11-01'], [{ period: '2026-11-01', pieceId: 'gone', onHand: 4, reserved: 0 }], PIECES);
    expect(unknownPieces).toEqual(['gone']);
    expect(points[0].onHandCents).toBe(0);
  });
});

test('the CSV writes money in the currency’s own decimals: cents for USD, none for JPY (Intl.NumberFormat)', async () => {
  const Papa = (await import('papaparse')).default;
  const { stockValueCsv } = await import('./stock-value');
  const unparse = (rows: { fields: string[]; data: string[][] }) => Papa.unparse(rows, { newline: '\r\n' });
  const points = [{ period: '2026-11-01', onHandCents: 49_050, reservedCents: 0, byMaterial: { 'Baltic birch': 49_050 } }];
  expect(stockValueCsv(points, 'USD', unparse).split('\r\n')).toEqual([
    'Period from,On hand (USD),Reserved (USD),Baltic birch on hand (USD)',
    '2026-11-01,490.50,0.00,490.50',
  ]);
  expect(stockValueCsv(points, 'JPY', unparse).split('\r\n')[1]).toBe('2026-11-01,49050,0,49050');
});

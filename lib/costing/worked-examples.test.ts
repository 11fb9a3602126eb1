import { describe, expect, test } from 'vitest';
import { currencyDigits, depositAndBalance, formatMoney, labourLines, quoteTotals, toMinorUnits, type QuoteLineInput } from './index';

// The shops below are invented; each table's arithmetic was checked by hand (lib/costing/RULES.md).
const ALDER_RATES = {
  minutesPerCut: 0.75,
  minutesPerPiece: 2.5,
  setupMinutesPerCard: 20,
  minutesPerJointCorner: 1.5,
  assemblyMinutesPerBox: 12,
  finishingMinutesPerM2: 9,
};
const ALDER_JOB = { cuts: 46, piecesHandled: 9, setupCards: 2, jointCorners: 16, drawerBoxes: 4, faceAreaMm2: 6_437_000 };

describe('RULES.md worked example 1 — Alder & Finch Joinery (invented), arithmetic checked by hand', () => {
  test('labour: minutes exact, hours to 0.01 h half up, finishing area to 0.01 m² first', () => {
    const lines = labourLines(ALDER_JOB, ALDER_RATES);
    expect(lines.map((l) => [l.kind, l.centiMinutes, l.hours])).toEqual([
      ['saw', 5700, 0.95],
      ['machining', 6400, 1.07],
      ['assembly', 4800, 0.8],
      ['finishing', 5796, 0.97],
    ]);
    expect(lines[3].areaM2).toBe(6.44);
  });

  test('finishing is left off when the shop sets no rate', () => {
    expect(labourLines(ALDER_JOB, { ...ALDER_RATES, finishingMinutesPerM2: null }).map((l) => l.kind)).toEqual(['saw', 'machining', 'assembly']);
  });

  test('lines, subtotal, discount, tax on taxable lines, total, deposit, balance, cost and margin', () => {
    const lines: QuoteLineInput[] = [
      { kind: 'material', quantity: 3, unitCostMinor: 6840, taxable: true },
      { kind: 'material', quantity: 1, unitCostMinor: 937, taxable: true },
      { kind: 'material', quantity: 1, unitCostMinor: 3219, taxable: true },
      { kind: 'hardware', quantity: 4, unitCostMinor: 1495, taxable: true },
      { kind: 'hardware', quantity: 4, unitCostMinor: 385, taxable: true },
      { kind: 'labour', quantity: 0.95, unitCostMinor: 6500, taxable: false },
      { kind: 'labour', quantity: 1.07, unitCostMinor: 7200, taxable: false },
      { kind: 'labour', quantity: 0.8, unitCostMinor: 5500, taxable: false },
      { kind: 'labour', quantity: 0.97, unitCostMinor: 4800, taxable: false },
    ];
    const t = quoteTotals({
      currency: 'USD',
      lines,
      markupPercent: { material: 30, hardware: 20 },
      discount: { kind: 'percent', percent: 5 },
      taxPercent: 8.25,
      depositPercent: 50,
    });
    expect(t.lines.map((l) => [l.costMinor, l.markupMinor, l.priceMinor])).toEqual([
      [20520, 6156, 26676],
      [937, 281, 1218],
      [3219, 966, 4185],
      [5980, 1196, 7176],
      [1540, 308, 1848],
      [6175, 0, 6175],
      [7704, 0, 7704],
      [4400, 0, 4400],
      [4656, 0, 4656],
    ]);
    expect(t.lines[0].unitPriceMinor).toBe(8892);
    expect(t).toMatchObject({
      subtotalMinor: 64038,
      discountMinor: 3202,
      taxableMinor: 39048,
      taxMinor: 3221,
      totalMinor: 64057,
      depositMinor: 32029,
      balanceMinor: 32028,
      costMinor: 55131,
      marginMinor: 5705,
      marginPercent: 9.4,
    });
    expect(formatMoney(t.totalMinor, 'USD')).toBe('$640.57');
  });
});

describe('RULES.md worked example 2 — Kōbō Hinoki (invented), JPY without cents, arithmetic checked by hand', () => {
  test('Intl gives JPY no decimals, USD two and KWD three (ISO 4217)', () => {
    expect([currencyDigits('JPY'), currencyDigits('USD'), currencyDigits('KWD'), currencyDigits('eur')]).toEqual([0, 2, 3, 2]);
    expect(toMinorUnits(9850, 'JPY')).toBe(9850);
    expect(toMinorUnits(19.99, 'USD')).toBe(1999);
    expect(() => toMinorUnits(9850.5, 'JPY')).toThrow(/at most 0 decimals/);
  });

  test('the quote', () => {
    const t = quoteTotals({
      currency: 'JPY',
      lines: [
        { kind: 'material', quantity: 2, unitCostMinor: 9850, taxable: true },
        { kind: 'labour', quantity: 1.33, unitCostMinor: 4500, taxable: true },
      ],
      markupPercent: { material: 25, hardware: 0 },
      discount: { kind: 'amount', minor: 610 },
      taxPercent: 10,
      depositPercent: 30,
    });
    expect(t).toMatchObject({
      subtotalMinor: 30610,
      discountMinor: 610,
      taxableMinor: 30000,
      taxMinor: 3000,
      totalMinor: 33000,
      depositMinor: 9900,
      balanceMinor: 23100,
    });
    expect(formatMoney(t.totalMinor, 'JPY')).toBe('¥33,000');
  });
});

describe('RULES.md worked example 3 — deposits that do not divide evenly, arithmetic checked by hand', () => {
  test.each([
    ['USD', 100001, 50, 50001, 50000],
    ['USD', 1, 50, 1, 0],
    ['USD', 10000, 33.33, 3333, 6667],
    ['JPY', 33333, 50, 16667, 16666],
    ['KWD', 12345, 50, 6173, 6172],
  ])('%s %i at %d %%', (currency, total, percent, deposit, balance) => {
    expect(depositAndBalance(total, percent, currency)).toEqual({ depositMinor: deposit, balanceMinor: balance });
  });

  test('KWD shows three decimals', () => {
    expect(formatMoney(6173, 'KWD')).toMatch(/6\.173/);
  });
});

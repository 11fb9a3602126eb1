import { describe, expect, test } from 'vitest';
import Papa from 'papaparse';
import { overall, percentText, periodTotals, shares, yieldCsv } from './yield-report';

const IMPERIAL = { system: 'imperial', precision: 16, feet: false } as const;
const row = (period: string, material: string, stockArea: number, partArea: number, spoiledArea = 0, keptArea = 0) => ({
  period,
  material,
  thickness: 18,
  plans: 1,
  stockArea,
  partArea,
  spoiledArea,
  keptArea,
  sawWasteArea: stockArea - partArea - spoiledArea - keptArea,
});

describe('the yield report’s figures (worked by hand)', () => {
  test('a period’s yield is weighted by stock area: 800,000 of 2,000,000 and 405,000 of 500,000 make 1,205,000 of 2,500,000 = 48.2 %', () => {
    const [p] = periodTotals([row('2026-11-01', 'Birch ply', 2_000_000, 800_000), row('2026-11-01', 'MDF', 500_000, 405_000)]);
    expect(p.yield).toBeCloseTo(0.482, 12);
    expect(percentText(p.yield)).toBe('48.2 %');
    // Not the mean of 40 % and 81 % (60.5 %).
    expect(percentText(p.yield)).not.toBe('60.5 %');
  });

  test('the shares of a period add up to the whole stock area', () => {
    const s = shares(row('2026-11-01', 'Birch ply', 2_000_000, 800_000, 200_000, 450_000));
    expect([s.yield, s.spoiled, s.kept, s.sawWaste]).toEqual([0.4, 0.1, 0.225, 0.275]);
    expect(s.yield! + s.spoiled! + s.kept! + s.sawWaste!).toBeCloseTo(1, 12);
  });

  test('nothing to divide by prints a dash, never NaN', () => {
    expect(shares(row('2026-11-01', 'x', 0, 0)).yield).toBeNull();
    expect(percentText(null)).toBe('—');
    expect(percentText(Number.NaN)).toBe('—');
    expect(overall([]).yield).toBeNull();
  });

  test('the CSV: one line per period and material, areas in ft² (1 ft² = 92,903.04 mm², NIST), formula-looking names neutralised', () => {
    const csv = yieldCsv([row('2026-11-01', '=HYPERLINK("x")', 92_903.04 * 10, 92_903.04 * 4)], IMPERIAL);
    const [head, line] = Papa.parse<string[]>(csv.trim()).data;
    expect(head).toEqual([
      'Period from',
      'Material',
      'Thickness (mm)',
      'Plans',
      'Stock (ft²)',
      'Parts (ft²)',
      'Kept offcuts (ft²)',
      'Saw waste (ft²)',
      'Spoiled (ft²)',
      'Yield (%)',
      'Saw waste (%)',
      'Spoiled (%)',
    ]);
    expect(line).toEqual(['2026-11-01', `'=HYPERLINK("x")`, '18', '1', '10.000', '4.000', '0.000', '6.000', '0.000', '40.0', '60.0', '0.0']);
  });
});

describe('the offcut report’s CSV', async () => {
  const { offcutUseCsv, rackShare } = await import('./offcut-report');
  test('the rack’s share of what was cut: 500,000 from offcuts and 1,500,000 new is 25 % (worked by hand), in m² for a metric shop', () => {
    const r = {
      period: '2026-12-01',
      fromRackArea: 500_000,
      fromNewStockArea: 1_500_000,
      racked: 2,
      rackedArea: 450_000,
      used: 1,
      usedArea: 500_000,
      scrapped: 0,
      scrappedArea: 0,
    };
    expect(rackShare(r)).toBe(0.25);
    const [, line] = Papa.parse<string[]>(offcutUseCsv([r], { system: 'metric', precision: 1, feet: false }).trim()).data;
    expect(line).toEqual(['2026-12-01', '0.500', '1.500', '25.0', '2', '0.450', '1', '0.500', '0', '0.000']);
    expect(rackShare({ ...r, fromRackArea: 0, fromNewStockArea: 0 })).toBeNull();
  });
});

test('periods are named as a person reads them: a month, or the Monday its week starts on', async () => {
  const { periodLabel } = await import('./yield-report');
  expect(periodLabel('2026-11-01', 'month')).toBe('Nov 2026');
  expect(periodLabel('2026-11-23', 'week')).toBe('Week of Nov 23, 2026');
  expect(() => periodLabel('soon', 'month')).toThrow(RangeError);
});

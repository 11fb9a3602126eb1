/**
 * The yield report's figures from its rows (one per period, material and thickness): shares of the stock area,
 * totals per period for the chart, and the CSV the owner exports. Pure: the rows come from `db/queries/reports`.
 */
import Papa from 'papaparse';
import { FORMULA_START } from '@/lib/cut-list/export-csv';
import type { ShopUnits } from '@/shared/schemas/units';

export interface YieldFigures {
  stockArea: number;
  partArea: number;
  spoiledArea: number;
  keptArea: number;
  sawWasteArea: number;
}

export interface YieldShares {
  /** Parts' share of the stock area, 0–1; null with no stock. */
  yield: number | null;
  sawWaste: number | null;
  spoiled: number | null;
  kept: number | null;
}

export const shares = (f: YieldFigures): YieldShares =>
  f.stockArea > 0
    ? {
        yield: f.partArea / f.stockArea,
        sawWaste: f.sawWasteArea / f.stockArea,
        spoiled: f.spoiledArea / f.stockArea,
        kept: f.keptArea / f.stockArea,
      }
    : { yield: null, sawWaste: null, spoiled: null, kept: null };

const add = (a: YieldFigures, b: YieldFigures): YieldFigures => ({
  stockArea: a.stockArea + b.stockArea,
  partArea: a.partArea + b.partArea,
  spoiledArea: a.spoiledArea + b.spoiledArea,
  keptArea: a.keptArea + b.keptArea,
  sawWasteArea: a.sawWasteArea + b.sawWasteArea,
});
const ZERO: YieldFigures = { stockArea: 0, partArea: 0, spoiledArea: 0, keptArea: 0, sawWasteArea: 0 };

/** Per period, every material together: shares weighted by stock area (a sheet counts for its area, not once). */
export function periodTotals<R extends YieldFigures & { period: string }>(rows: readonly R[]) {
  const by = new Map<string, YieldFigures>();
  for (const r of rows) by.set(r.period, add(by.get(r.period) ?? ZERO, r));
  return [...by.entries()].sort(([a], [b]) => a.localeCompare(b)).map(([period, f]) => ({ period, ...f, ...shares(f) }));
}

export const overall = (rows: readonly YieldFigures[]) => {
  const f = rows.reduce(add, ZERO);
  return { ...f, ...shares(f) };
};

/** A share as the report prints it: "40.0 %", or an em dash with nothing to divide by (never NaN). */
export const percentText = (share: number | null) => (share === null || !Number.isFinite(share) ? '—' : `${(share * 100).toFixed(1)} %`);

/** Square metres or square feet to 3 decimals, as a plain number a spreadsheet reads. */
const areaNumber = (mm2: number, units: ShopUnits) => (units.system === 'metric' ? mm2 / 1e6 : mm2 / (304.8 * 304.8)).toFixed(3);

export function yieldCsv(
  rows: readonly (YieldFigures & { period: string; material: string; thickness: number; plans: number })[],
  units: ShopUnits,
): string {
  const unit = units.system === 'metric' ? 'm²' : 'ft²';
  const fields = [
    'Period from',
    'Material',
    'Thickness (mm)',
    'Plans',
    `Stock (${unit})`,
    `Parts (${unit})`,
    `Kept offcuts (${unit})`,
    `Saw waste (${unit})`,
    `Spoiled (${unit})`,
    'Yield (%)',
    'Saw waste (%)',
    'Spoiled (%)',
  ];
  const pct = (s: number | null) => (s === null ? '' : (s * 100).toFixed(1));
  const data = rows.map((r) => {
    const s = shares(r);
    return [
      r.period,
      r.material,
      String(r.thickness),
      String(r.plans),
      areaNumber(r.stockArea, units),
      areaNumber(r.partArea, units),
      areaNumber(r.keptArea, units),
      areaNumber(r.sawWasteArea, units),
      areaNumber(r.spoiledArea, units),
      pct(s.yield),
      pct(s.sawWaste),
      pct(s.spoiled),
    ];
  });
  return Papa.unparse({ fields, data }, { escapeFormulae: FORMULA_START, newline: '\r\n' });
}

/** A period's name as the report shows it: "Nov 2026", or "Week of Nov 23, 2026" (weeks start on Monday). */
export function periodLabel(period: string, by: 'week' | 'month'): string {
  const at = new Date(`${period}T12:00:00Z`);
  if (Number.isNaN(at.getTime())) throw new RangeError(`"${period}" is not a YYYY-MM-DD day.`);
  const fmt = (o: Intl.DateTimeFormatOptions) => new Intl.DateTimeFormat('en-US', { timeZone: 'UTC', ...o }).format(at);
  return by === 'month' ? fmt({ month: 'short', year: 'numeric' }) : `Week of ${fmt({ month: 'short', day: 'numeric', year: 'numeric' })}`;
}

/** The offcut report's CSV, from `db/queries/reports` rows: one line per period. */
import Papa from 'papaparse';
import { FORMULA_START } from '@/lib/cut-list/export-csv';
import type { ShopUnits } from '@/shared/schemas/units';

export interface OffcutUseFigures {
  period: string;
  fromRackArea: number;
  fromNewStockArea: number;
  racked: number;
  rackedArea: number;
  used: number;
  usedArea: number;
  scrapped: number;
  scrappedArea: number;
}

/** The rack's share of the stock area cut in a period, 0–1; null when nothing was cut. */
export const rackShare = (r: OffcutUseFigures) => {
  const all = r.fromRackArea + r.fromNewStockArea;
  return all > 0 ? r.fromRackArea / all : null;
};

export function offcutUseCsv(rows: readonly OffcutUseFigures[], units: ShopUnits): string {
  const unit = units.system === 'metric' ? 'm²' : 'ft²';
  const area = (mm2: number) => (units.system === 'metric' ? mm2 / 1e6 : mm2 / (304.8 * 304.8)).toFixed(3);
  const fields = [
    'Period from',
    `Cut from offcuts (${unit})`,
    `Cut from new stock (${unit})`,
    'From offcuts (%)',
    'Offcuts racked',
    `Racked (${unit})`,
    'Offcuts used',
    `Used (${unit})`,
    'Offcuts scrapped',
    `Scrapped (${unit})`,
  ];
  const data = rows.map((r) => {
    const s = rackShare(r);
    return [
      r.period,
      area(r.fromRackArea),
      area(r.fromNewStockArea),
      s === null ? '' : (s * 100).toFixed(1),
      String(r.racked),
      area(r.rackedArea),
      String(r.used),
      area(r.usedArea),
      String(r.scrapped),
      area(r.scrappedArea),
    ];
  });
  return Papa.unparse({ fields, data }, { escapeFormulae: FORMULA_START, newline: '\r\n' });
}

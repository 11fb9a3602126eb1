import Papa from 'papaparse';
import type { ShopUnits } from '@/shared/schemas/units';
import type { GrainRule } from '@/shared/schemas/drawer-schedule';
import { exactLengthText } from './exact-length';
import { PART_FIELDS, type PartFieldRow } from '@/shared/part-fields';

/**
 * Cells a spreadsheet would run as a formula: those starting with = + - @, tab or carriage return (OWASP,
 * "CSV Injection"). Papaparse's own default pattern ends in `.*$` without the dotall flag, so a formula followed by
 * a line break slips through it; this one tests the first character only.
 */
export const FORMULA_START = /^[=+\-@\t\r]/;

export interface ExportPart {
  label: string;
  quantity: number;
  length: number;
  width: number;
  thickness: number;
  material: string;
  grain: GrainRule;
  jointAllowance: number;
  notes: string;
  /** The drawer schedule a row comes from, if any. */
  schedule?: string | null;
}

/** Decimal inches precise to 0.0001″ (0.00254 mm), far finer than any saw. */
const INCH_DECIMALS = 4;

/**
 * A length in the column's unit, exact enough that a re-upload gives the same part: an inch fraction when the length
 * is on the 1/32″ grid, else decimal inches (355.41 mm → 13.9925"), never a rounded "~11/16" nor a length in mm under
 * an inch header; millimetres in a metric shop.
 */
export function csvLength(mm: number, units: ShopUnits): string {
  const text = exactLengthText(mm, units, 'ascii');
  if (units.system === 'metric' || !text.endsWith(' mm')) return text;
  return `${Number((mm / 25.4).toFixed(INCH_DECIMALS))}"`;
}

/** The cut list as CSV in the shop's unit, readable again by the upload (same header words), formula cells neutralised. */
export function cutListCsv(parts: readonly ExportPart[], units: ShopUnits): string {
  const unit = units.system === 'imperial' ? 'in' : 'mm';
  const len = (mm: number) => csvLength(mm, units);
  // One column per part field, in the table's order (shared/part-fields.ts), then the schedule a row comes from.
  const fields = [...PART_FIELDS.map((f) => (f.kind === 'length' ? `${f.csv} (${unit})` : f.csv)), 'Drawer schedule'];
  const cell = (p: ExportPart, f: PartFieldRow): string | number => {
    if (f.key === 'grain') return p.grain === 'along-length' ? 'along' : 'any';
    if (f.key === 'jointAllowance') return p.jointAllowance > 0 ? len(p.jointAllowance) : '';
    if (f.kind === 'length') return len(p[f.key] as number);
    return p[f.key];
  };
  const data = parts.map((p) => [...PART_FIELDS.map((f) => cell(p, f)), p.schedule ?? '']);
  return Papa.unparse({ fields, data }, { escapeFormulae: FORMULA_START, newline: '\r\n' });
}

import Papa from 'papaparse';
import type { ShopUnits } from '@/shared/schemas/units';
import type { GrainRule } from '@/shared/schemas/drawer-schedule';
import { exactLengthText } from './exact-length';

/**
 * Cells a spreadsheet would run as a formula: those starting with = + - @, tab or carriage return (OWASP,
 * "CSV Injection"). Papaparse's own default pattern ends in `.*$` without the dotall flag, so a formula followed by
 * a line break slips through it; this one tests the first character only.
 */
export const FORMULA_START = /^[=+\-@\t\r]/;

export interface ExportPart {
  label: string;
  quantity: number;
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  material: string;
  grain: GrainRule;
  jointAllowanceMm: number;
  notes: string;
  /** The drawer schedule a row comes from, if any. */
  schedule?: string | null;
}

/** The cut list as CSV in the shop's unit, readable again by the upload (same header words), formula cells neutralised. */
export function cutListCsv(parts: readonly ExportPart[], units: ShopUnits): string {
  const unit = units.system === 'imperial' ? 'in' : 'mm';
  // Exact values only, so a re-upload gives the same parts (a rounded "~11/16" would not).
  const len = (mm: number) => exactLengthText(mm, units, 'ascii');
  const fields = ['Part', 'Quantity', `Length (${unit})`, `Width (${unit})`, `Thickness (${unit})`, 'Material', 'Grain', `Joint allowance (${unit})`, 'Notes', 'Drawer schedule'];
  const data = parts.map((p) => [
    p.label,
    p.quantity,
    len(p.lengthMm),
    len(p.widthMm),
    len(p.thicknessMm),
    p.material,
    p.grain === 'along-length' ? 'along' : 'any',
    p.jointAllowanceMm > 0 ? len(p.jointAllowanceMm) : '',
    p.notes,
    p.schedule ?? '',
  ]);
  return Papa.unparse({ fields, data }, { escapeFormulae: FORMULA_START, newline: '\r\n' });
}

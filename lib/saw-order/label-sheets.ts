/**
 * Label sheets for part tags. Sizes in mm. Letter 3 × 10: 2-5/8″ × 1″ labels, ½″ top margin, 3/16″ side margin,
 * ⅛″ between columns (common practice, no source: the usual 30-up address-label sheet). A4 3 × 10: 70 × 29.7 mm
 * labels that tile the page with no margins (derived: 210 / 3 = 70, 297 / 10 = 29.7). A4 3 × 8: 70 × 36 mm, 4.5 mm
 * top and bottom margins (common practice, no source).
 */
import { inches } from '@/lib/units/length';

export interface LabelSheet {
  id: string;
  name: string;
  page: { width: number; height: number; css: string };
  columns: number;
  rows: number;
  label: { width: number; height: number };
  margin: { top: number; left: number };
  gap: { x: number; y: number };
}

export const LABEL_SHEETS = [
  {
    id: 'letter-30',
    name: 'Letter, 3 × 10 (2-5/8″ × 1″)',
    page: { width: inches(8.5), height: inches(11), css: 'letter' },
    columns: 3,
    rows: 10,
    label: { width: inches(2.625), height: inches(1) },
    margin: { top: inches(0.5), left: inches(3 / 16) },
    gap: { x: inches(1 / 8), y: 0 },
  },
  {
    id: 'a4-30',
    name: 'A4, 3 × 10 (70 × 29.7 mm)',
    page: { width: 210, height: 297, css: 'A4' },
    columns: 3,
    rows: 10,
    label: { width: 70, height: 29.7 },
    margin: { top: 0, left: 0 },
    gap: { x: 0, y: 0 },
  },
  {
    id: 'a4-24',
    name: 'A4, 3 × 8 (70 × 36 mm)',
    page: { width: 210, height: 297, css: 'A4' },
    columns: 3,
    rows: 8,
    label: { width: 70, height: 36 },
    margin: { top: 4.5, left: 0 },
    gap: { x: 0, y: 0 },
  },
] as const satisfies readonly LabelSheet[];

export type LabelSheetId = (typeof LABEL_SHEETS)[number]['id'];

export const labelSheet = (id: string | undefined): LabelSheet => LABEL_SHEETS.find((s) => s.id === id) ?? LABEL_SHEETS[0];

/** Where label `i` of a page sits (top-left corner, mm from the page's top-left). */
export function labelOrigin(sheet: LabelSheet, i: number) {
  const col = i % sheet.columns;
  const row = Math.floor(i / sheet.columns);
  return { x: sheet.margin.left + col * (sheet.label.width + sheet.gap.x), y: sheet.margin.top + row * (sheet.label.height + sheet.gap.y) };
}

/** Items split into pages of one sheet's labels; nothing is left off. */
export function paginate<T>(items: readonly T[], sheet: LabelSheet): T[][] {
  const per = sheet.columns * sheet.rows;
  const pages: T[][] = [];
  for (let i = 0; i < items.length; i += per) pages.push(items.slice(i, i + per));
  return pages;
}

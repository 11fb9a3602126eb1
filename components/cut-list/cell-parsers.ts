import { parseLength } from '@/lib/units/parse-length';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { formatLength } from '@/lib/units/format-length';
import { shopLengthUnit, type ShopUnits } from '@/shared/schemas/units';
import { partPatchSchema, type Part, type PartInput } from '@/shared/schemas/part';
import { LENGTH_KEYS, PART_FIELDS, PART_KEYS, type PartKey } from '@/shared/part-fields';

/** The editable columns of the cut list, in keyboard order. */
export const COLUMNS = PART_KEYS;
export type Column = PartKey;
export type TextColumn = Exclude<Column, 'grain'>;

export const COLUMN_TITLES = Object.fromEntries(PART_FIELDS.map((f) => [f.key, f.title])) as Record<Column, string>;

const LENGTH_COLUMNS = new Set<Column>(LENGTH_KEYS);
export const isLengthColumn = (c: Column) => LENGTH_COLUMNS.has(c);

/** What a cell shows for a stored value. */
export function cellText(part: Pick<Part, TextColumn>, column: TextColumn, units: ShopUnits): string {
  const value = part[column];
  if (column === 'jointAllowance') return (value as number) > 0 ? formatLength(value as number, units) : '';
  // Thickness comes from the stock room (18 mm, 23/32″): shown exactly, never as a rounded fraction.
  if (column === 'thickness') return exactLengthText(value as number, units);
  if (isLengthColumn(column)) return formatLength(value as number, units);
  return String(value);
}

export type CellParse<T> = { ok: true; value: T } | { ok: false; error: string };

/**
 * Reads what a person typed into one cell — lengths in any form lib/units accepts, in the shop's unit — and checks it
 * with the same schema the API uses, so a cell shows its own error before anything is sent.
 */
export function parseCell(column: TextColumn, text: string, units: ShopUnits): CellParse<PartInput[TextColumn]> {
  let value: unknown = text.trim();
  if (column === 'quantity') {
    if (!/^\d+$/.test(text.trim())) return { ok: false, error: 'Quantity must be a whole number.' };
    value = Number(text.trim());
  } else if (isLengthColumn(column)) {
    if (column === 'jointAllowance' && text.trim() === '') value = 0;
    else {
      const parsed = parseLength(text, { unit: shopLengthUnit(units) });
      if (!parsed.ok) return { ok: false, error: parsed.error };
      value = parsed.mm;
    }
  }
  const checked = partPatchSchema.shape[column].safeParse(value);
  if (!checked.success) return { ok: false, error: checked.error.issues[0]?.message ?? 'Not valid.' };
  return { ok: true, value: checked.data as PartInput[TextColumn] };
}

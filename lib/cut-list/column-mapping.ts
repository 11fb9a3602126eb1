import { CUT_LIST_FIELDS, type CutListField } from '@/shared/schemas/cut-list-upload';
import { UPLOAD_FIELDS } from '@/shared/part-fields';

/** Header words shops use for each field (lower case, punctuation dropped). */
const SYNONYMS: Record<CutListField, readonly string[]> = {
  label: ['part', 'part name', 'name', 'label', 'description', 'item', 'component', 'piece'],
  quantity: ['qty', 'quantity', 'count', 'pcs', 'pieces', 'no', 'number', 'amount', 'q'],
  length: ['length', 'len', 'l', 'long', 'length along grain'],
  width: ['width', 'wid', 'w', 'wide'],
  thickness: ['thickness', 'thick', 't', 'th', 'thk'],
  material: ['material', 'stock', 'species', 'sheet', 'mat'],
  grain: ['grain', 'grain direction', 'grain rule', 'rotate', 'rotation'],
  jointAllowance: ['joint allowance', 'allowance', 'joint', 'extra length'],
  notes: ['notes', 'note', 'comment', 'comments', 'remarks', 'edge', 'edging'],
};

const normalise = (header: string) =>
  header
    .toLowerCase()
    .replace(/\(.*?\)|\[.*?\]/g, ' ') // "Length (in)" → "length"
    .replace(/[^a-z ]+/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();

/** The field a header names, if it names one. */
export function fieldForHeader(header: string): CutListField | null {
  const h = normalise(header);
  if (!h) return null;
  return CUT_LIST_FIELDS.find((f) => SYNONYMS[f].includes(h)) ?? null;
}

/** A column → field guess from the header row; each field is taken by its first matching column only. */
export function guessMapping(header: readonly string[]): (CutListField | null)[] {
  const taken = new Set<CutListField>();
  return header.map((h) => {
    const field = fieldForHeader(h);
    if (!field || taken.has(field)) return null;
    taken.add(field);
    return field;
  });
}

/** A first row is a header when at least two of its cells name fields and none of the mapped ones hold a number. */
export function looksLikeHeader(row: readonly string[]): boolean {
  const named = row.filter((c) => fieldForHeader(c) !== null).length;
  return named >= 2 && !row.some((c) => /^\s*[\d.,/\s-]+\s*$/.test(c) && c.trim() !== '');
}

/** The mapping a file without a header most likely has: the template's column order. */
export const TEMPLATE_COLUMNS: readonly CutListField[] = UPLOAD_FIELDS;

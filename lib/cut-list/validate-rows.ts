import { parseLength, type LengthUnit } from '@/lib/units/parse-length';
import { CUT_LIST_FIELD_LABELS, type CutListField, type CutListUpload } from '@/shared/schemas/cut-list-upload';
import { partInputSchema, type PartInput } from '@/shared/schemas/part';
import type { GrainRule } from '@/shared/schemas/drawer-schedule';
import type { RowProblem, UploadRowResult } from '@/shared/wire/jobs';
import { UPLOAD_LIMITS } from './limits';

export type { RowProblem, UploadRowResult };

export interface UploadReport {
  rows: UploadRowResult[];
  valid: { line: number; part: PartInput }[];
  invalidCount: number;
}

/** Thinner than any sheet or board a shop cuts; a smaller value is nearly always inches read as mm. */
export const MIN_PART_THICKNESS_MM = 1;

const GRAIN_WORDS: Record<string, GrainRule> = {
  '': 'along-length',
  along: 'along-length',
  'along length': 'along-length',
  'along-length': 'along-length',
  length: 'along-length',
  lengthwise: 'along-length',
  yes: 'along-length',
  y: 'along-length',
  true: 'along-length',
  '1': 'along-length',
  grain: 'along-length',
  l: 'along-length',
  fixed: 'along-length',
  any: 'any',
  either: 'any',
  'either way': 'any',
  none: 'any',
  no: 'any',
  n: 'any',
  false: 'any',
  '0': 'any',
  free: 'any',
  rotate: 'any',
  'no grain': 'any',
};

// Control characters other than tab, newline and carriage return never belong in a cut list cell.
const CONTROL = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F]/;

/** Every row of an upload checked on its own: a part, or every reason it cannot be one. */
export function validateUploadRows(upload: Pick<CutListUpload, 'columns' | 'rows' | 'unit'>): UploadReport {
  const rows = upload.rows.map(({ line, cells }) => validateRow(line, upload.columns, cells, upload.unit));
  const valid = rows.flatMap((r) => (r.ok ? [{ line: r.line, part: r.part }] : []));
  return { rows, valid, invalidCount: rows.length - valid.length };
}

function validateRow(line: number, columns: readonly CutListField[], cells: readonly string[], unit: LengthUnit): UploadRowResult {
  const { raw, problems } = readCells(columns, cells);
  const values = readPart(raw, unit, problems);
  if (problems.length) return { line, ok: false, problems };
  // The same schema the editor and API use decides the rest (name length, quantity range, size range).
  const parsed = partInputSchema.safeParse({ ...values, notes: raw.notes ?? '' });
  if (parsed.success) return { line, ok: true, part: parsed.data };
  return {
    line,
    ok: false,
    problems: parsed.error.issues.map((issue) => ({ field: schemaFieldToColumn(String(issue.path[0] ?? '')), message: issue.message })),
  };
}

type RawCells = Partial<Record<CutListField, string>>;

/** Each cell trimmed, or a problem: longer than the limit, or holding control characters. */
function readCells(columns: readonly CutListField[], cells: readonly string[]): { raw: RawCells; problems: RowProblem[] } {
  const problems: RowProblem[] = [];
  const raw: RawCells = {};
  columns.forEach((field, i) => {
    const value = (cells[i] ?? '').trim();
    const label = CUT_LIST_FIELD_LABELS[field];
    if (value.length > UPLOAD_LIMITS.maxCellLength)
      problems.push({ field, message: `${label} is ${value.length} characters long; the limit is ${UPLOAD_LIMITS.maxCellLength}.` });
    else if (CONTROL.test(value)) problems.push({ field, message: `${label} contains control characters.` });
    else raw[field] = value;
  });
  return { raw, problems };
}

/** The part's values read from its cells, adding a problem for each that is missing or does not read. */
function readPart(raw: RawCells, unit: LengthUnit, problems: RowProblem[]) {
  const bad = new Set(problems.map((p) => p.field));
  const need = (field: CutListField): string | undefined => {
    if (bad.has(field)) return undefined;
    const v = raw[field] ?? '';
    if (!v) problems.push({ field, message: `${CUT_LIST_FIELD_LABELS[field]} is empty.` });
    return v || undefined;
  };
  const lengthIn = (field: CutListField, text: string | undefined): number | undefined => {
    if (text === undefined) return undefined;
    const parsed = parseLength(text, { unit });
    if (parsed.ok) return parsed.mm;
    problems.push({ field, message: `${CUT_LIST_FIELD_LABELS[field]} “${text}”: ${parsed.error}` });
    return undefined;
  };

  const label = need('label');
  const quantityText = need('quantity');
  let quantity: number | undefined;
  if (quantityText !== undefined) {
    if (/^\d+$/.test(quantityText)) quantity = Number(quantityText);
    else problems.push({ field: 'quantity', message: `Quantity “${quantityText}” is not a whole number.` });
  }
  const length = lengthIn('length', need('length'));
  const width = lengthIn('width', need('width'));
  const thickness = lengthIn('thickness', need('thickness'));
  if (thickness !== undefined && thickness < MIN_PART_THICKNESS_MM)
    problems.push({
      field: 'thickness',
      message: `Thickness “${raw.thickness}” reads as ${thickness} mm — thinner than any stock. If it is inches, choose inches or write ${raw.thickness}″.`,
    });
  const material = need('material');
  const grain = bad.has('grain') ? 'along-length' : readGrain(raw.grain, problems);
  const jointAllowance = raw.jointAllowance ? lengthIn('jointAllowance', raw.jointAllowance) : 0;
  if (jointAllowance !== undefined && length !== undefined && jointAllowance >= length)
    problems.push({ field: 'jointAllowance', message: 'Joint allowance is part of the length, so it must be shorter than the length.' });
  return { label, quantity, length, width, thickness, material, grain, jointAllowance };
}

/** Along the length unless the cell says otherwise in words the shop uses. */
function readGrain(text: string | undefined, problems: RowProblem[]): GrainRule {
  if (text === undefined) return 'along-length';
  const word = GRAIN_WORDS[text.toLowerCase()];
  if (word) return word;
  problems.push({ field: 'grain', message: `Grain “${text}” is not understood: write “along” (grain runs along the length) or “any”.` });
  return 'along-length';
}

const COLUMN_OF: Record<string, CutListField> = {
  label: 'label',
  quantity: 'quantity',
  length: 'length',
  width: 'width',
  thickness: 'thickness',
  material: 'material',
  grain: 'grain',
  jointAllowance: 'jointAllowance',
  notes: 'notes',
};
const schemaFieldToColumn = (key: string): CutListField | 'row' => COLUMN_OF[key] ?? 'row';

import { z } from 'zod';
import { UPLOAD_LIMITS } from '@/lib/cut-list/limits';
import { lengthUnitSchema } from './units';
import { PART_FIELDS, REQUIRED_UPLOAD_FIELDS, UPLOAD_FIELDS, type UploadField } from '@/shared/part-fields';

/** What a column of an uploaded cut list can hold. */
export const CUT_LIST_FIELDS = UPLOAD_FIELDS as readonly UploadField[] as unknown as readonly [UploadField, ...UploadField[]];
export type CutListField = UploadField;

/** A row cannot become a part without these. */
export const REQUIRED_CUT_LIST_FIELDS: readonly CutListField[] = REQUIRED_UPLOAD_FIELDS;

export const CUT_LIST_FIELD_LABELS = Object.fromEntries(PART_FIELDS.map((f) => [f.key, f.csv])) as Record<CutListField, string>;

const cell = z.string().max(UPLOAD_LIMITS.maxCellLength * 4, 'A cell is far longer than any cut list needs.');

/**
 * An uploaded cut list after the browser read the file and the person mapped its columns: only mapped columns are
 * sent, each row with its line number in the file so every message points at the right row.
 */
const uploadShape = z.object({
  columns: z
    .array(z.enum(CUT_LIST_FIELDS))
    .min(1, 'Map at least one column.')
    .max(CUT_LIST_FIELDS.length)
    .refine((cols) => new Set(cols).size === cols.length, 'Each field can be mapped from one column only.'),
  rows: z
    .array(z.object({ line: z.int().min(1), cells: z.array(cell).max(CUT_LIST_FIELDS.length) }))
    .min(1, 'The file has no data rows.')
    .max(UPLOAD_LIMITS.maxRows, `At most ${UPLOAD_LIMITS.maxRows.toLocaleString('en-US')} rows in one upload; split the file.`),
  /** How bare numbers are read. */
  unit: lengthUnitSchema,
});

function requireColumns(body: { columns: CutListField[] }, ctx: z.RefinementCtx) {
  const missing = REQUIRED_CUT_LIST_FIELDS.filter((f) => !body.columns.includes(f));
  if (missing.length)
    ctx.addIssue({ code: 'custom', path: ['columns'], message: `Map a column to ${missing.map((f) => CUT_LIST_FIELD_LABELS[f]).join(', ')}.` });
}

export const cutListUploadSchema = uploadShape.superRefine(requireColumns);
export type CutListUpload = z.infer<typeof cutListUploadSchema>;

/** Import: `all` writes nothing unless every row is valid; `valid-only` writes the valid rows and skips the rest. */
export const cutListImportSchema = uploadShape.extend({ mode: z.enum(['all', 'valid-only']).default('all') }).superRefine(requireColumns);
export type CutListImport = z.infer<typeof cutListImportSchema>;

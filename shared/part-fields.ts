/**
 * The fields of a part, once: how the cut list's grid, the upload, the CSV export and the server name and treat each
 * one. The grid's columns, their titles, the upload's fields and header words, which fields an upload must have, which
 * a drawer schedule owns and how a message names them are all read from this table: a new field is one row here (and
 * its column in the schema).
 */
export const PART_FIELDS = [
  { key: 'label', title: 'Part', csv: 'Part', spoken: 'name', kind: 'text', required: true, scheduleOwned: true },
  { key: 'quantity', title: 'Qty', csv: 'Quantity', spoken: 'quantity', kind: 'count', required: true, scheduleOwned: true },
  { key: 'length', title: 'Length', csv: 'Length', spoken: 'length', kind: 'length', required: true, scheduleOwned: true },
  { key: 'width', title: 'Width', csv: 'Width', spoken: 'width', kind: 'length', required: true, scheduleOwned: true },
  {
    key: 'thickness',
    title: 'Thickness',
    csv: 'Thickness',
    spoken: 'thickness',
    kind: 'length',
    required: true,
    scheduleOwned: true,
  },
  { key: 'material', title: 'Material', csv: 'Material', spoken: 'material', kind: 'text', required: true, scheduleOwned: true },
  { key: 'grain', title: 'Grain', csv: 'Grain', spoken: 'grain', kind: 'grain', required: false, scheduleOwned: true },
  {
    key: 'jointAllowance',
    title: 'Joint allow.',
    csv: 'Joint allowance',
    spoken: 'joint allowance',
    kind: 'length',
    required: false,
    scheduleOwned: true,
  },
  { key: 'notes', title: 'Notes', csv: 'Notes', spoken: 'notes', kind: 'text', required: false, scheduleOwned: false },
] as const;

export type PartFieldRow = (typeof PART_FIELDS)[number];
/** A part's property (`length`), as the grid, the upload and the database name it. */
export type PartKey = PartFieldRow['key'];
/** An uploaded column's field: a part's property (an uploaded length is in the file's unit until it is read). */
export type UploadField = PartKey;

type FieldOf<K extends keyof PartFieldRow, Where> = Extract<PartFieldRow, Where>[K];
const keysWhere = <W extends Partial<PartFieldRow>>(where: W) =>
  PART_FIELDS.filter((f) => Object.entries(where).every(([k, v]) => f[k as keyof PartFieldRow] === v)).map((f) => f.key);

/** The grid's columns, in keyboard order. */
export const PART_KEYS = PART_FIELDS.map((f) => f.key) as readonly PartKey[];
/** The fields a drawer schedule owns on its rows: change the schedule, not the row. */
export const SCHEDULE_OWNED_KEYS = keysWhere({ scheduleOwned: true }) as readonly FieldOf<'key', { scheduleOwned: true }>[];
/** Fields held as lengths (typed in any unit, stored in mm). */
export const LENGTH_KEYS = keysWhere({ kind: 'length' }) as readonly PartKey[];
/** The upload's fields, in the template's order (a file without a header is read in this order). */
export const UPLOAD_FIELDS = PART_KEYS;
/** An uploaded row cannot become a part without these. */
export const REQUIRED_UPLOAD_FIELDS = PART_FIELDS.filter((f) => f.required).map((f) => f.key) as readonly UploadField[];

const byKey = new Map<string, PartFieldRow>(PART_FIELDS.map((f) => [f.key, f]));
export const partField = (key: PartKey): PartFieldRow => byKey.get(key)!;

import { z } from 'zod';
import { text } from './text';
import { MAX_LENGTH_MM } from '@/lib/units/parse-length';
import { grainRuleSchema } from './drawer-schedule';
import { PART_FIELDS, SCHEDULE_OWNED_KEYS, type PartKey } from '@/shared/part-fields';

/** One cut-list row. Lengths are mm (the client parses what a person typed with `lib/units` first). */

export const MAX_PART_QUANTITY = 10_000;
export const MAX_PART_LABEL = 80;
export const MAX_PART_MATERIAL = 200;
export const MAX_PART_NOTES = 500;

/** The smallest part size taken: half a millimetre (thinner than any veneer a saw cuts; 5e-324 mm was accepted). */
export const MIN_PART_SIZE_MM = 0.5;

const sizeMm = (what: string) =>
  z
    .number({ error: `${what} must be a length.` })
    .finite(`${what} must be a length.`)
    .min(MIN_PART_SIZE_MM, `${what} must be at least ${MIN_PART_SIZE_MM} mm.`)
    .max(MAX_LENGTH_MM, `${what} above ${MAX_LENGTH_MM / 1000} m looks like a slipped unit.`);

const partShape = {
  label: text().min(1, 'Give the part a name.').max(MAX_PART_LABEL, `Keep the name under ${MAX_PART_LABEL} characters.`),
  quantity: z
    .int({ error: 'Quantity must be a whole number.' })
    .min(1, 'Quantity must be at least 1.')
    .max(MAX_PART_QUANTITY, `Quantity above ${MAX_PART_QUANTITY.toLocaleString('en-US')} looks like a typo.`),
  /** Along the grain when `grain` is `along-length`; the joint allowance is part of it. */
  length: sizeMm('Length'),
  width: sizeMm('Width'),
  thickness: sizeMm('Thickness'),
  material: text().min(1, 'Pick or type a material.').max(MAX_PART_MATERIAL, `Keep the material under ${MAX_PART_MATERIAL} characters.`),
  grain: grainRuleSchema,
  /** Extra length the part's joints need; informational, already inside `length`. */
  jointAllowance: z.number().finite().min(0, 'Joint allowance cannot be negative.').max(MAX_LENGTH_MM),
  notes: text({ multiline: true }).max(MAX_PART_NOTES, `Keep notes under ${MAX_PART_NOTES} characters.`),
};

export const partInputSchema = z.object({
  ...partShape,
  grain: partShape.grain.default('along-length'),
  jointAllowance: partShape.jointAllowance.default(0),
  notes: partShape.notes.default(''),
  /** The row's place in the list, to put a deleted row back where it was (undo); new rows go to the end. */
  sort: z.int().min(0).max(1_000_000).optional(),
});
export type PartInput = z.output<typeof partInputSchema>;

/** A change to some cells of a row: no defaults, so a field left out stays as it is. */
export const partPatchSchema = z.object(partShape).partial();
export type PartPatch = z.output<typeof partPatchSchema>;

/** Fields a drawer schedule owns on its rows: change the schedule, not the row. */
export const SCHEDULE_OWNED_FIELDS = SCHEDULE_OWNED_KEYS;

/** How a message names each field ("change its length in the schedule"). */
export const PART_FIELD_NAMES = Object.fromEntries(PART_FIELDS.map((f) => [f.key, f.spoken])) as Record<PartKey, string>;

export const partParams = z.object({ id: z.uuid(), partId: z.uuid() });

/** A cut-list row as the API returns it. */
export interface Part extends PartInput {
  id: string;
  jobId: string;
  drawerScheduleId: string | null;
  /** For drawer-schedule rows: front, back, side, bottom, applied-front. */
  role: string | null;
  machining: string[];
  sort: number;
}

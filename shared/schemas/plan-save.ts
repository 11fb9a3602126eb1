/**
 * Saving plans: a new draft from a Nest (the server rebuilds the request from the database with the same settings
 * and stock choice, then judges the plan with `validatePlan`), and an edited document from the layout bench.
 * The plan itself is taken as it comes and judged by `validatePlan`, so a bad one is refused with its violations.
 */
import { z } from 'zod';
import { text } from './text';
import { nestSettingsObjectSchema } from './nesting';
import { nestForSchema } from './recut';

export const planNameSchema = text().min(1, 'Give the plan a name.').max(120, 'Keep the name under 120 characters.');

const s = nestSettingsObjectSchema.shape;
/**
 * Settings a Nest may override; the rest come from the shop. Built without the defaults of `nestSettingsSchema`
 * (a `.partial()` would still fill them in and overrule the shop's kerf and trim).
 */
export const nestSettingsOverrideSchema = z.object({
  kerf: s.kerf.unwrap().optional(),
  trim: s.trim.unwrap().optional(),
  minOffcutLength: s.minOffcutLength.unwrap().optional(),
  minOffcutWidth: s.minOffcutWidth.unwrap().optional(),
  style: s.style.unwrap().optional(),
  objective: s.objective.unwrap().optional(),
  timeBudgetMs: s.timeBudgetMs.unwrap().optional(),
  seed: s.seed.unwrap().optional(),
  preferOffcuts: s.preferOffcuts.unwrap().optional(),
  /** The shop's saw to cut on (its id in Shop settings); the request carries its whole profile. */
  sawId: z.uuid().optional(),
  /** A saw that breaks the stock down first (a track saw); needs `sawId`. */
  breakdownSawId: z.uuid().optional(),
});
export type NestSettingsOverride = z.infer<typeof nestSettingsOverrideSchema>;

export const planCreateSchema = z.object({
  name: planNameSchema.default('Plan'),
  settings: nestSettingsOverrideSchema.default({}),
  /** The stock the Nest was offered (ids from the job's nest request). */
  stockIds: z.array(text().min(1).max(100)).min(1, 'Choose at least one kind of stock.').max(1000),
  /** What was nested: the cut list, or only the job's open re-cuts (the plan then records that it is a re-cut plan). */
  for: nestForSchema.default('cut-list'),
  plan: z.unknown(),
});
export type PlanCreate = z.infer<typeof planCreateSchema>;

export const planUpdateSchema = z.object({
  name: planNameSchema.optional(),
  plan: z.unknown(),
  /** `updatedAt` of the plan the bench loaded: a save over someone else's newer save is refused (409). */
  baseUpdatedAt: z.iso.datetime({ offset: true }).optional(),
});
export type PlanUpdate = z.infer<typeof planUpdateSchema>;

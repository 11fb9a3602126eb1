import { doublePrecision, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './columns';

/**
 * The drawer slides a shop hangs its boxes on, as their makers specify them (shared/schemas/slide-model.ts). A drawer
 * schedule copies the model's rule when it is saved, so editing or deleting a model never changes a saved schedule.
 */
export const slideModels = pgTable(
  'slide_models',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    /** `undermount` or `side-mount`. */
    kind: text('kind').notNull(),
    name: text('name').notNull(),
    /** The lengths it is made in, mm, shortest first. */
    lengths: jsonb('lengths_mm').$type<number[]>().notNull(),
    /** `inside`: inside width = opening − deduction; `outside`: box width = opening − deduction. */
    widthRule: text('width_rule').notNull(),
    widthDeduction: doublePrecision('width_deduction_mm').notNull(),
    maxSideThickness: doublePrecision('max_side_thickness_mm'),
    bottomRecess: doublePrecision('bottom_recess_mm').notNull().default(0),
    heightClearance: doublePrecision('height_clearance_mm').notNull(),
    rearClearance: doublePrecision('rear_clearance_mm').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  // One name per shop; its leading shop column also serves the shop's list.
  (t) => [uniqueIndex('slide_models_shop_name_idx').on(t.shopId, t.name)],
);

import { doublePrecision, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './columns';

/**
 * The saws a shop cuts sheet goods on (shared/schemas/saw.ts): the profile a nest keeps to. A saved plan copies the
 * profile into its request, so editing or deleting a saw never changes a saved plan. Lengths in mm; a null capacity
 * is no limit.
 */
export const saws = pgTable(
  'saws',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    /** `table-saw`, `sliding-table-saw`, `panel-saw`, `track-saw` or `other` (then `kind_name`). */
    kind: text('kind').notNull(),
    kindName: text('kind_name'),
    name: text('name').notNull(),
    kerf: doublePrecision('kerf_mm').notNull(),
    ripCapacity: doublePrecision('rip_capacity_mm'),
    crosscutCapacity: doublePrecision('crosscut_capacity_mm'),
    maxPieceLength: doublePrecision('max_piece_length_mm'),
    maxPieceWidth: doublePrecision('max_piece_width_mm'),
    /** 2, 3 or 4; null: any. */
    maxStages: integer('max_stages'),
    /** `rip` or `crosscut`. */
    firstStage: text('first_stage').notNull().default('rip'),
    minFenceWidth: doublePrecision('min_fence_width_mm').notNull(),
    /** The order the shop lists them in: the first is the nest's default. */
    position: integer('position').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('saws_shop_idx').on(t.shopId, t.position)],
);

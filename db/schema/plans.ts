import { boolean, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { planStatusEnum } from './enums';
import { jobIdColumn } from './jobs';
import { shopIdColumn } from './columns';
import { users } from './users';

/** A nesting result for a job. The full plan document is kept with its schema version; pieces and steps are
 * broken out so the shop floor can tick steps and the stock room can reserve exact pieces. */
export const plans = pgTable(
  'plans',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    jobId: jobIdColumn(),
    name: text('name').notNull().default('Plan'),
    status: planStatusEnum('status').notNull().default('draft'),
    version: integer('version').notNull().default(1),
    request: jsonb('request').notNull(),
    document: jsonb('document').notNull(),
    yieldRatio: doublePrecision('yield_ratio'),
    costCents: integer('cost_cents'),
    /** Recorded when the plan is done: share of the stock area that was neither part nor kept offcut (spoiled included). */
    wasteRatio: doublePrecision('waste_ratio'),
    /** Recorded when the plan is done: share of the stock area in parts damaged at the saw (part of the waste). */
    spoiledRatio: doublePrecision('spoiled_ratio'),
    /** Nested from the job's open re-cuts rather than its cut list. */
    recutPlan: boolean('recut_plan').notNull().default(false),
    releasedAt: timestamp('released_at', { withTimezone: true }),
    releasedBy: uuid('released_by').references(() => users.id, { onDelete: 'set null' }),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
    finishedBy: uuid('finished_by').references(() => users.id, { onDelete: 'set null' }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('plans_job_idx').on(t.shopId, t.jobId),
    // The reports read finished plans by the time they were finished.
    index('plans_finished_idx').on(t.shopId, t.status, t.finishedAt),
  ],
);

export const planPieces = pgTable(
  'plan_pieces',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    planId: uuid('plan_id')
      .notNull()
      .references(() => plans.id, { onDelete: 'cascade' }),
    index: integer('index').notNull(),
    stockItemId: uuid('stock_item_id'),
    offcutId: uuid('offcut_id'),
    material: text('material').notNull(),
    thickness: doublePrecision('thickness_mm').notNull(),
    length: doublePrecision('length_mm').notNull(),
    width: doublePrecision('width_mm').notNull(),
    toBuy: boolean('to_buy').notNull().default(false),
    /** Written when the plan is finished: the area of the parts cut whole, and of those damaged (for the reports). */
    partAreaMm2: doublePrecision('part_area_mm2'),
    spoiledAreaMm2: doublePrecision('spoiled_area_mm2'),
  },
  (t) => [index('plan_pieces_plan_idx').on(t.planId)],
);

export const placements = pgTable(
  'placements',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    planPieceId: uuid('plan_piece_id')
      .notNull()
      .references(() => planPieces.id, { onDelete: 'cascade' }),
    partId: uuid('part_id'),
    instance: integer('instance').notNull(),
    x: doublePrecision('x_mm').notNull(),
    y: doublePrecision('y_mm').notNull(),
    length: doublePrecision('length_mm').notNull(),
    width: doublePrecision('width_mm').notNull(),
    rotated: boolean('rotated').notNull().default(false),
    locked: boolean('locked').notNull().default(false),
    damaged: boolean('damaged').notNull().default(false),
  },
  (t) => [index('placements_piece_idx').on(t.planPieceId)],
);

/** Ticks on a plan's saw order: one row per step done. The steps themselves live in the plan document. */
export const sawSteps = pgTable(
  'saw_steps',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    planId: uuid('plan_id')
      .notNull()
      .references(() => plans.id, { onDelete: 'cascade' }),
    pieceIndex: integer('piece_index').notNull(),
    seq: integer('seq').notNull(),
    doneAt: timestamp('done_at', { withTimezone: true }).notNull().defaultNow(),
    doneBy: uuid('done_by').references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [uniqueIndex('saw_steps_step_key').on(t.planId, t.pieceIndex, t.seq)],
);

export const auditEvents = pgTable(
  'audit_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    userId: uuid('user_id').references(() => users.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    entity: text('entity').notNull(),
    entityId: text('entity_id'),
    data: jsonb('data'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('audit_events_shop_idx').on(t.shopId, t.createdAt)],
);

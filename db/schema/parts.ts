import { check, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { grainRuleEnum } from './enums';
import { jobIdColumn } from './jobs';
import { shopIdColumn } from './columns';

export const drawerSchedules = pgTable(
  'drawer_schedules',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    jobId: jobIdColumn(),
    label: text('label').notNull(),
    /** The schedule's full input, validated by shared/schemas/drawer-schedule.ts. */
    input: jsonb('input').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('drawer_schedules_job_idx').on(t.shopId, t.jobId)],
);

export const parts = pgTable(
  'parts',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    jobId: jobIdColumn(),
    label: text('label').notNull(),
    quantity: integer('quantity').notNull(),
    /** Along the grain, joint allowance included. */
    length: doublePrecision('length_mm').notNull(),
    width: doublePrecision('width_mm').notNull(),
    thickness: doublePrecision('thickness_mm').notNull(),
    material: text('material').notNull(),
    grain: grainRuleEnum('grain').notNull().default('along-length'),
    jointAllowance: doublePrecision('joint_allowance_mm').notNull().default(0),
    notes: text('notes').notNull().default(''),
    /** Set when the row was derived from a drawer schedule (kept in step with it). */
    drawerScheduleId: uuid('drawer_schedule_id').references(() => drawerSchedules.id, { onDelete: 'cascade' }),
    role: text('role'),
    machining: jsonb('machining').$type<string[]>(),
    sort: integer('sort').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('parts_job_idx').on(t.shopId, t.jobId),
    check('parts_quantity_positive', sql`${t.quantity} > 0`),
    check('parts_sizes_positive', sql`${t.length} > 0 and ${t.width} > 0 and ${t.thickness} > 0`),
  ],
);

export const setupCards = pgTable(
  'setup_cards',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    joint: text('joint').notNull(),
    stockThickness: doublePrecision('stock_thickness_mm').notNull(),
    fields: jsonb('fields').$type<Record<string, number | string>>().notNull(),
    note: text('note').notNull().default(''),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('setup_cards_shop_idx').on(t.shopId)],
);

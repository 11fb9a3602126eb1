import { sql } from 'drizzle-orm';
import { check, doublePrecision, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { grainRuleEnum, recutStatusEnum } from './enums';
import { shopIdColumn } from './columns';
import { jobIdColumn } from './jobs';
import { parts } from './parts';
import { plans } from './plans';
import { users } from './users';

/**
 * A job's re-cut list: one row per part instance that came off the saw damaged. The part's size, material and grain
 * are copied here, so a later change to the cut list does not change what must be cut again.
 */
export const recuts = pgTable(
  'recuts',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    jobId: jobIdColumn(),
    /** The cut-list row it came from, while that row exists. */
    partId: uuid('part_id').references(() => parts.id, { onDelete: 'set null' }),
    label: text('label').notNull(),
    /** Which of the part's pieces was damaged ("Side #3"). */
    instance: integer('instance').notNull(),
    quantity: integer('quantity').notNull().default(1),
    /** Along the grain, joint allowance included (as the part). */
    length: doublePrecision('length_mm').notNull(),
    width: doublePrecision('width_mm').notNull(),
    thickness: doublePrecision('thickness_mm').notNull(),
    material: text('material').notNull(),
    grain: grainRuleEnum('grain').notNull().default('along-length'),
    jointAllowance: doublePrecision('joint_allowance_mm').notNull().default(0),
    reason: text('reason').notNull().default(''),
    status: recutStatusEnum('status').notNull().default('open'),
    /** The plan at whose finish the damage was recorded. */
    sourcePlanId: uuid('source_plan_id').references(() => plans.id, { onDelete: 'set null' }),
    /** The re-cut plan that holds it (planned) or cut it (cut, spoiled). */
    recutPlanId: uuid('recut_plan_id').references(() => plans.id, { onDelete: 'set null' }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    closedAt: timestamp('closed_at', { withTimezone: true }),
    closedBy: uuid('closed_by').references(() => users.id, { onDelete: 'set null' }),
    cancelReason: text('cancel_reason').notNull().default(''),
  },
  (t) => [
    index('recuts_job_idx').on(t.shopId, t.jobId, t.status),
    check('recuts_quantity_positive', sql`${t.quantity} > 0`),
    check('recuts_sizes_positive', sql`${t.length} > 0 and ${t.width} > 0 and ${t.thickness} > 0`),
  ],
);

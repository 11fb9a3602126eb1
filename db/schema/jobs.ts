import { date, index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { jobStatusEnum } from './enums';
import { shopIdColumn } from './columns';
import { users } from './users';

export const jobs = pgTable(
  'jobs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    name: text('name').notNull(),
    customer: text('customer').notNull().default(''),
    status: jobStatusEnum('status').notNull().default('quoting'),
    dueDate: date('due_date'),
    notes: text('notes').notNull().default(''),
    /** When a person (later: a paid deposit) marked the job won; a job whose plans are all cancelled goes back to won. */
    wonAt: timestamp('won_at', { withTimezone: true }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('jobs_shop_idx').on(t.shopId)],
);

/** The column tying a row to its job; the row goes when the job is deleted. */
export const jobIdColumn = () =>
  uuid('job_id')
    .notNull()
    .references(() => jobs.id, { onDelete: 'cascade' });

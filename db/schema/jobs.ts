import { sql } from 'drizzle-orm';
import { date, index, integer, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { jobStatusEnum } from './enums';
import { shopIdColumn } from './columns';
import { users } from './users';
import { customers } from './customers';

export const jobs = pgTable(
  'jobs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    name: text('name').notNull(),
    /** Who the job is for; null for a job without a customer yet (or the shop's own work). */
    customerId: uuid('customer_id').references(() => customers.id, { onDelete: 'no action' }),
    status: jobStatusEnum('status').notNull().default('quoting'),
    dueDate: date('due_date'),
    notes: text('notes').notNull().default(''),
    /** When a person (later: a paid deposit) marked the job accepted; a job whose plans are all cancelled goes back to accepted. */
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    /**
     * The job's pieces (its parts' quantities summed) and its parts' materials, once each: kept by a trigger on parts
     * in the same statement as every insert, change or delete of a part (migration 0014), so the jobs list reads
     * them off the job instead of adding up its parts on every request. Never written by the app.
     */
    partPieces: integer('part_pieces').notNull().default(0),
    partMaterials: text('part_materials')
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
  },
  (t) => [
    index('jobs_shop_idx').on(t.shopId),
    index('jobs_customer_idx').on(t.customerId),
    // The jobs list's default order (latest change first, ties by id): a page is read off the index.
    index('jobs_shop_updated_idx').on(t.shopId, t.updatedAt, t.id),
  ],
);

/** The column tying a row to its job; the row goes when the job is deleted. */
export const jobIdColumn = () =>
  uuid('job_id')
    .notNull()
    .references(() => jobs.id, { onDelete: 'cascade' });

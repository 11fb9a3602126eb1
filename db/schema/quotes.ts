import { doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import type { QuoteDiscount, QuoteLine } from '@/shared/schemas/quote';
import { quoteRevisionStatusEnum } from './enums';
import { shopIdColumn } from './columns';
import { jobIdColumn } from './jobs';
import { plans } from './plans';
import { users } from './users';

/** A job's quote, numbered per shop (Q-0007); what it says lives in its revisions (rev A, B…). */
export const quotes = pgTable(
  'quotes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    jobId: jobIdColumn(),
    number: integer('number').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('quotes_shop_number_idx').on(t.shopId, t.number), index('quotes_job_idx').on(t.jobId)],
);

/**
 * One revision of a quote: its lines (every one editable, copied from the job when made) and the figures it was priced
 * with (copied from Shop settings, so changing the settings never changes a quote). Only the latest may be sent.
 */
export const quoteRevisions = pgTable(
  'quote_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    quoteId: uuid('quote_id')
      .notNull()
      .references(() => quotes.id, { onDelete: 'cascade' }),
    jobId: jobIdColumn(),
    /** 0 is rev A, 1 rev B… */
    revision: integer('revision').notNull(),
    status: quoteRevisionStatusEnum('status').notNull().default('draft'),
    /** The plan the material and saw time came from (null once that plan is deleted, or for a quote without one). */
    planId: uuid('plan_id').references(() => plans.id, { onDelete: 'set null' }),
    currency: text('currency').notNull(),
    lines: jsonb('lines').$type<QuoteLine[]>().notNull(),
    markupMaterialPercent: doublePrecision('markup_material_percent').notNull(),
    markupHardwarePercent: doublePrecision('markup_hardware_percent').notNull(),
    discount: jsonb('discount').$type<QuoteDiscount>().notNull(),
    taxPercent: doublePrecision('tax_percent').notNull(),
    depositPercent: doublePrecision('deposit_percent').notNull(),
    validityDays: integer('validity_days').notNull(),
    terms: text('terms').notNull(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('quote_revisions_quote_revision_idx').on(t.quoteId, t.revision), index('quote_revisions_job_idx').on(t.jobId)],
);

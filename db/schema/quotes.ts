import { date, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import type { QuoteDiscount, QuoteLine } from '@/shared/schemas/quote';
import { paymentStatusEnum, quoteRevisionStatusEnum } from './enums';
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
    /** The SHA-256 of the customer's link token (/q/<token>), set when the revision is sent; the token is only in the mail. */
    linkTokenHash: text('link_token_hash'),
    /** The last day (in the shop's time zone) the quote holds, set when sent. */
    validUntil: date('valid_until'),
    /** The customer's answer: accepted with their typed full name, from an address, or declined with a reason. */
    answeredAt: timestamp('answered_at', { withTimezone: true }),
    acceptedName: text('accepted_name'),
    answeredFrom: text('answered_from'),
    declineReason: text('decline_reason'),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('quote_revisions_quote_revision_idx').on(t.quoteId, t.revision),
    index('quote_revisions_job_idx').on(t.jobId),
    uniqueIndex('quote_revisions_link_token_idx').on(t.linkTokenHash),
  ],
);

/**
 * A deposit paid (or being paid) through the payments service for an accepted revision: one row per checkout the
 * customer opened. The amount is the revision's deposit computed on the server when the checkout was made.
 */
export const quotePayments = pgTable(
  'quote_payments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => quoteRevisions.id, { onDelete: 'cascade' }),
    jobId: jobIdColumn(),
    /** The payments service's checkout session id. */
    checkoutSessionId: text('checkout_session_id').notNull(),
    /** The payments service's payment id, once paid (refunds name it). */
    paymentIntentId: text('payment_intent_id'),
    amountMinor: integer('amount_minor').notNull(),
    currency: text('currency').notNull(),
    status: paymentStatusEnum('status').notNull().default('open'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    paidAt: timestamp('paid_at', { withTimezone: true }),
    refundedAt: timestamp('refunded_at', { withTimezone: true }),
  },
  (t) => [
    uniqueIndex('quote_payments_session_idx').on(t.checkoutSessionId),
    index('quote_payments_revision_idx').on(t.revisionId),
    index('quote_payments_job_idx').on(t.jobId),
    index('quote_payments_intent_idx').on(t.paymentIntentId),
  ],
);

/** Every payments-service event the webhook took in, by its id: a replayed event finds its row and changes nothing. */
export const paymentEvents = pgTable('payment_events', {
  id: text('id').primaryKey(),
  type: text('type').notNull(),
  /** The payment it moved, if any (an event about a session we never made moves none). */
  paymentId: uuid('payment_id').references(() => quotePayments.id, { onDelete: 'set null' }),
  outcome: text('outcome').notNull(),
  receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
});

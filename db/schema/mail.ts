import { sql } from 'drizzle-orm';
import { check, index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { shopIdColumn } from './columns';
import { users } from './users';

export interface OutboxAttachment {
  filename: string;
  contentType: string;
  /** The file's bytes, base64. */
  content: string;
}

/**
 * Mail waiting to go out, written in the same transaction as the change that causes it (an invite, a reset link, a
 * quote sent…) and delivered by the sender in the server process (server/mail/sender.ts):
 * pending → sending (claimed until `claimed_until`) → sent, or back to pending with a later `next_attempt_at` after a
 * temporary failure, or failed (a permanent refusal, too many attempts, or delivery left uncertain twice).
 * The Message-ID is fixed here, so a resend after a crash carries the same one.
 */
export const mailOutbox = pgTable(
  'mail_outbox',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    /** What the mail is about ('invite', 'password-reset', 'quote'…): server/mail/outbox.ts MAIL_KINDS. */
    kind: text('kind').notNull(),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    textBody: text('text_body').notNull(),
    htmlBody: text('html_body'),
    attachments: jsonb('attachments').$type<OutboxAttachment[]>().notNull().default([]),
    messageId: text('message_id').notNull(),
    status: text('status').notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true }).notNull().defaultNow(),
    /** While `sending`: the claim's end. A row still `sending` after it was left by a sender that stopped. */
    claimedUntil: timestamp('claimed_until', { withTimezone: true }),
    /** How many times a claim was taken over after a sender stopped mid-delivery (each may be a resend). */
    staleClaims: integer('stale_claims').notNull().default(0),
    lastError: text('last_error'),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('mail_outbox_message_id_key').on(t.messageId),
    index('mail_outbox_due_idx').on(t.status, t.nextAttemptAt),
    index('mail_outbox_shop_idx').on(t.shopId, t.createdAt),
    check('mail_outbox_status_check', sql`${t.status} in ('pending', 'sending', 'sent', 'failed')`),
  ],
);

/**
 * Single-use links sent by mail (a team invite, a password reset). Only the SHA-256 of the token is stored; the
 * token itself exists only in the mail. A link works once (`used_at`) and until `expires_at`.
 */
export const userTokens = pgTable(
  'user_tokens',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    shopId: shopIdColumn(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: text('purpose').notNull(),
    tokenHash: text('token_hash').notNull(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('user_tokens_hash_key').on(t.tokenHash),
    index('user_tokens_user_idx').on(t.userId, t.purpose),
    check('user_tokens_purpose_check', sql`${t.purpose} in ('invite', 'password-reset')`),
  ],
);

import type { ShopScope } from '@/db/scope';
import { notFound } from '@/lib/errors';
/**
 * The outbox: how any feature sends mail. Call `enqueueMail(tx, message)` inside the transaction that makes the
 * change the mail reports (an invite, a reset link, a quote sent), so the mail exists exactly when the change does;
 * the sender in the server process (server/mail/sender.ts) delivers it, retrying temporary failures.
 *
 *   await db.transaction(async (tx) => {
 *     const quote = await …;
 *     await enqueueMail(tx, { shopId, kind: 'quote', to: customer.email, subject, text, html, attachments: [pdf] });
 *   });
 */
import { randomUUID } from 'node:crypto';
import { and, desc, eq } from 'drizzle-orm';
import { z } from 'zod';
import type { Db } from '@/db/open';
import { mailOutbox } from '@/db/schema';
import { mailConfig } from '@/lib/mail/config';

/** What a mail is about. Add a kind here when a feature starts sending a new one. */
export const MAIL_KINDS = ['invite', 'password-reset', 'quote', 'quote-accepted', 'deposit-receipt', 'purchase-order', 'low-stock-digest'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

const MAX_ATTACHMENT_BYTES = 15 * 1024 * 1024;

export const outboxMessageSchema = z.object({
  shopId: z.uuid(),
  kind: z.enum(MAIL_KINDS),
  to: z.email('The recipient’s e-mail address is not valid.').max(320),
  subject: z
    .string()
    .trim()
    .min(1, 'A mail needs a subject.')
    .max(300)
    .refine((s) => !/[\r\n]/.test(s), 'A subject is one line.'),
  /** The plain-text part: always there, and complete on its own. */
  text: z.string().min(1, 'A mail needs a plain-text part.').max(200_000),
  /** The HTML part (no remote images, no tracking). */
  html: z.string().max(500_000).optional(),
  attachments: z
    .array(
      z.object({
        filename: z
          .string()
          .trim()
          .min(1)
          .max(200)
          .refine((s) => !/[\r\n/\\]/.test(s), 'An attachment name has no slashes or line breaks.'),
        contentType: z.string().regex(/^[\w.+-]+\/[\w.+-]+$/, 'A content type looks like application/pdf.'),
        content: z.base64('Attachment content must be base64.'),
      }),
    )
    .max(10)
    .refine((list) => list.reduce((n, a) => n + (a.content.length * 3) / 4, 0) <= MAX_ATTACHMENT_BYTES, 'Attachments may total at most 15 MB.')
    .default([]),
});
export type OutboxMessage = z.input<typeof outboxMessageSchema>;

export interface QueuedMail {
  id: string;
  messageId: string;
}

/** Writes one message to the outbox in the caller's transaction; its Message-ID is fixed now. */
export async function enqueueMail(tx: Db, message: OutboxMessage): Promise<QueuedMail> {
  const m = outboxMessageSchema.parse(message);
  const messageId = `<${randomUUID()}@${mailConfig().domain}>`;
  const [row] = await tx
    .insert(mailOutbox)
    .values({
      shopId: m.shopId,
      kind: m.kind,
      toAddress: m.to,
      subject: m.subject,
      textBody: m.text,
      htmlBody: m.html ?? null,
      attachments: m.attachments,
      messageId,
    })
    .returning({ id: mailOutbox.id });
  return { id: row.id, messageId };
}

import type { OutboxStatus } from '@/shared/wire/mail';

export type { OutboxStatus };

export interface OutboxEntry {
  id: string;
  kind: string;
  to: string;
  subject: string;
  status: OutboxStatus;
  attempts: number;
  lastError: string | null;
  nextAttemptAt: string;
  sentAt: string | null;
  createdAt: string;
}

/** A shop's recent outbox, newest first (the Outbox page); `failedOnly` for what needs the owner's eye. */
export async function shopOutbox({ db, shopId }: ShopScope, { failedOnly = false, limit = 100 } = {}): Promise<OutboxEntry[]> {
  const rows = await db
    .select()
    .from(mailOutbox)
    .where(failedOnly ? and(eq(mailOutbox.shopId, shopId), eq(mailOutbox.status, 'failed')) : eq(mailOutbox.shopId, shopId))
    .orderBy(desc(mailOutbox.createdAt), desc(mailOutbox.id))
    .limit(limit);
  return rows.map((r) => ({
    id: r.id,
    kind: r.kind,
    to: r.toAddress,
    subject: r.subject,
    status: r.status as OutboxStatus,
    attempts: r.attempts,
    lastError: r.lastError,
    nextAttemptAt: r.nextAttemptAt.toISOString(),
    sentAt: r.sentAt?.toISOString() ?? null,
    createdAt: r.createdAt.toISOString(),
  }));
}

/** The Message-IDs of every mail the shop sent (the demo's Sent mail page shows only the shop's own). */
export async function shopMessageIds({ db, shopId }: ShopScope): Promise<Set<string>> {
  const rows = await db.select({ id: mailOutbox.messageId }).from(mailOutbox).where(eq(mailOutbox.shopId, shopId));
  return new Set(rows.map((r) => r.id));
}

/** Puts a failed message back in the queue (the owner's "Try again"), keeping its Message-ID. */
export async function retryFailedMail({ db, shopId }: ShopScope, id: string): Promise<void> {
  const rows = await db
    .update(mailOutbox)
    .set({ status: 'pending', attempts: 0, staleClaims: 0, nextAttemptAt: new Date(), lastError: null, claimedUntil: null })
    .where(and(eq(mailOutbox.shopId, shopId), eq(mailOutbox.id, id), eq(mailOutbox.status, 'failed')))
    .returning({ id: mailOutbox.id });
  if (rows.length !== 1) throw notFound('That failed message');
}

/**
 * Delivers the outbox. Each round claims due rows with `FOR UPDATE SKIP LOCKED` (so several app servers on one
 * PostgreSQL never take the same row), marks them `sending` with a claim that lasts `claimMs`, commits, sends each
 * through nodemailer with the Message-ID fixed at enqueue, and marks it:
 * - accepted → `sent`;
 * - refused with a 5xx (a permanent refusal: no such mailbox, relaying denied…) → `failed` with the server's reason;
 * - anything else (connection refused, timeout, a 4xx) → back to `pending`, next try after an exponential backoff,
 *   `failed` after `maxAttempts`.
 * A sender that stops between the SMTP server's "accepted" and the mark leaves the row `sending`; when its claim
 * runs out another round takes it over and sends it again with the same Message-ID (receivers drop duplicates by
 * it). That happens at most once per message: a row left that way a second time is marked failed as uncertain
 * rather than sent a third time.
 */
import { and, eq, inArray, lte, or } from 'drizzle-orm';
import nodemailer, { type Transporter } from 'nodemailer';
import type { Db } from '@/db/open';
import { mailOutbox } from '@/db/schema';

type OutboxRow = typeof mailOutbox.$inferSelect;

export interface SenderOptions {
  db: Db;
  /** An SMTP URL, or a ready nodemailer transport. */
  transport: string | Transporter;
  from: string;
  /** The clock (tests move it instead of waiting). */
  now?: () => Date;
  batchSize?: number;
  claimMs?: number;
  maxAttempts?: number;
  /** Delay before the retry that follows attempt `n` (1-based). */
  backoffMs?: (attempt: number) => number;
  /** Tests only: runs after the SMTP server accepted a message and before it is marked sent. */
  afterSend?: (row: OutboxRow) => void | Promise<void>;
}

export interface RoundResult {
  claimed: number;
  sent: number;
  retrying: number;
  failed: number;
}

/** 10 s, 20 s, 40 s … capped at 30 minutes. */
export const defaultBackoffMs = (attempt: number) => Math.min(10_000 * 2 ** (attempt - 1), 30 * 60_000);

/** An SMTP reply in the 5xx range is permanent (RFC 5321 §4.2.1); everything else may pass on a later try. */
export function isPermanent(error: unknown): boolean {
  const code = (error as { responseCode?: number }).responseCode;
  return typeof code === 'number' && code >= 500 && code < 600;
}

function reason(error: unknown): string {
  const e = error as { responseCode?: number; response?: string; code?: string; message?: string };
  const text = e.response || e.message || String(error);
  return (e.responseCode ? text : e.code && !text.includes(e.code) ? `${e.code}: ${text}` : text).slice(0, 500);
}

/** The sender's options with their defaults filled in, and its transport. */
interface Sender {
  db: Db;
  from: string;
  now: () => Date;
  batchSize: number;
  claimMs: number;
  maxAttempts: number;
  backoffMs: (attempt: number) => number;
  transport: Transporter;
  afterSend?: SenderOptions['afterSend'];
}

function senderOf(options: SenderOptions): Sender {
  return {
    db: options.db,
    from: options.from,
    now: options.now ?? (() => new Date()),
    batchSize: options.batchSize ?? 10,
    claimMs: options.claimMs ?? 5 * 60_000,
    maxAttempts: options.maxAttempts ?? 8,
    backoffMs: options.backoffMs ?? defaultBackoffMs,
    transport:
      typeof options.transport === 'string'
        ? nodemailer.createTransport(options.transport, { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 60_000 } as never)
        : options.transport,
    afterSend: options.afterSend,
  };
}

export function createMailSender(options: SenderOptions) {
  const sender = senderOf(options);

  /** One round: claim what is due and deliver it. */
  async function runOnce(): Promise<RoundResult> {
    const rows = await claim(sender);
    const result: RoundResult = { claimed: rows.length, sent: 0, retrying: 0, failed: 0 };
    for (const row of rows) result[await deliver(sender, row)]++;
    return result;
  }

  let timer: NodeJS.Timeout | undefined;
  let running: Promise<unknown> | null = null;

  /** Rounds until nothing is due (a full batch means there may be more). */
  async function drain() {
    for (let i = 0; i < 100; i++) {
      const r = await runOnce();
      if (r.claimed < sender.batchSize) return;
    }
  }

  function tick() {
    if (running) return;
    running = drain()
      .catch((error) => console.error(`Mail sender: ${(error as Error).message}`))
      .finally(() => {
        running = null;
      });
  }

  return {
    runOnce,
    /** Polls every `intervalMs` in the background; `wake()` starts a round at once. */
    start(intervalMs = 2_000) {
      timer ??= setInterval(tick, intervalMs);
      timer.unref?.();
      tick();
    },
    wake: tick,
    async stop() {
      if (timer) clearInterval(timer);
      timer = undefined;
      await running;
      sender.transport.close();
    },
  };
}

/** Takes the due rows (and rows whose sender stopped) for this sender, in one short transaction. */
async function claim({ db, now, batchSize, claimMs }: Sender): Promise<OutboxRow[]> {
  const at = now();
  return db.transaction(async (tx) => {
    const due = await tx
      .select()
      .from(mailOutbox)
      .where(
        or(
          and(eq(mailOutbox.status, 'pending'), lte(mailOutbox.nextAttemptAt, at)),
          and(eq(mailOutbox.status, 'sending'), lte(mailOutbox.claimedUntil, at)),
        ),
      )
      .orderBy(mailOutbox.nextAttemptAt, mailOutbox.id)
      .limit(batchSize)
      .for('update', { skipLocked: true });
    if (!due.length) return [];
    const uncertain = due.filter((r) => r.status === 'sending' && r.staleClaims >= 1);
    if (uncertain.length) await failUncertain(tx, uncertain);
    const claimed: OutboxRow[] = [];
    for (const r of due.filter((r) => !uncertain.includes(r))) {
      const [row] = await tx
        .update(mailOutbox)
        .set({
          status: 'sending',
          attempts: r.attempts + 1,
          claimedUntil: new Date(at.getTime() + claimMs),
          staleClaims: r.status === 'sending' ? r.staleClaims + 1 : r.staleClaims,
        })
        .where(eq(mailOutbox.id, r.id))
        .returning();
      claimed.push(row);
    }
    return claimed;
  });
}

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** Rows whose sending stopped twice: they may have arrived, so they are not sent a third time. */
async function failUncertain(tx: Tx, rows: OutboxRow[]) {
  await tx
    .update(mailOutbox)
    .set({
      status: 'failed',
      claimedUntil: null,
      lastError: 'Sending stopped twice before this could be marked sent; it may have arrived. Check with the recipient before trying again.',
    })
    .where(
      inArray(
        mailOutbox.id,
        rows.map((r) => r.id),
      ),
    );
}

/** Sends one claimed row and marks what came of it. */
async function deliver(sender: Sender, row: OutboxRow): Promise<'sent' | 'retrying' | 'failed'> {
  const { db, now } = sender;
  try {
    await sender.transport.sendMail({
      from: sender.from,
      to: row.toAddress,
      subject: row.subject,
      text: row.textBody,
      ...(row.htmlBody ? { html: row.htmlBody } : {}),
      messageId: row.messageId,
      headers: { 'Auto-Submitted': 'auto-generated' },
      attachments: row.attachments.map((a) => ({ filename: a.filename, contentType: a.contentType, content: a.content, encoding: 'base64' })),
    });
  } catch (error) {
    return markRefused(sender, row, error);
  }
  await sender.afterSend?.(row);
  await db
    .update(mailOutbox)
    .set({ status: 'sent', sentAt: now(), claimedUntil: null, lastError: null })
    .where(and(eq(mailOutbox.id, row.id), eq(mailOutbox.status, 'sending')));
  return 'sent';
}

/** A send that did not go: failed for good on a 5xx or after the last attempt, else pending again after the backoff. */
async function markRefused({ db, now, maxAttempts, backoffMs }: Sender, row: OutboxRow, error: unknown): Promise<'retrying' | 'failed'> {
  const permanent = isPermanent(error);
  const giveUp = permanent || row.attempts >= maxAttempts;
  const why = reason(error);
  await db
    .update(mailOutbox)
    .set(
      giveUp
        ? {
            status: 'failed',
            claimedUntil: null,
            lastError: permanent ? `Refused by the mail server: ${why}` : `Gave up after ${row.attempts} attempts: ${why}`,
          }
        : { status: 'pending', claimedUntil: null, lastError: why, nextAttemptAt: new Date(now().getTime() + backoffMs(row.attempts)) },
    )
    .where(and(eq(mailOutbox.id, row.id), eq(mailOutbox.status, 'sending')));
  return giveUp ? 'failed' : 'retrying';
}

export type MailSender = ReturnType<typeof createMailSender>;

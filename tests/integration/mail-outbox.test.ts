import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import type { Db } from '@/db/open';
import { mailOutbox } from '@/db/schema';
import { listCaughtMail } from '@/server/mail/caught';
import { startMailCatcher, type MailCatcher } from '@/server/mail/catcher';
import { enqueueMail, shopOutbox } from '@/server/mail/outbox';
import { createMailSender, type SenderOptions } from '@/server/mail/sender';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { nextNumber, uniqueEmail } from '../support/unique';

let db: Db;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ db, fx } = app));

let catcher: MailCatcher;
let dir: string;
beforeEach(async () => {
  // Each test sees only its own messages.
  await db.delete(mailOutbox);
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'kw-mail-outbox-'));
  catcher = await startMailCatcher({ dir });
});
afterEach(async () => {
  await catcher.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

/** A clock the test moves by hand: the sender never waits on the wall clock here. */
function manualClock() {
  let t = Date.now() + 1_000;
  return { now: () => new Date(t), advance: (ms: number) => (t += ms) };
}

const sender = (clock: ReturnType<typeof manualClock>, extra: Partial<SenderOptions> = {}) =>
  createMailSender({ db, transport: catcher.url, from: 'Birchwood Joinery <shop@birchwood.example>', now: clock.now, ...extra });

async function queue(subject = `Message ${nextNumber()}`) {
  const to = uniqueEmail('recipient');
  const queued = await db.transaction((tx) =>
    enqueueMail(tx, { shopId: fx.mine.id, kind: 'invite', to, subject, text: `Plain text of ${subject}.`, html: `<p>HTML of ${subject}.</p>` }),
  );
  return { ...queued, to, subject };
}

const row = async (id: string) => (await db.select().from(mailOutbox).where(eq(mailOutbox.id, id)))[0];
const caughtWith = async (messageId: string) => (await listCaughtMail(dir)).filter((m) => m.messageId === messageId);

describe(`the outbox (${process.env.TEST_DATABASE_URL ? 'PostgreSQL' : 'PGlite'})`, () => {
  test('a message is written in the caller’s transaction: rolled back with it, kept with it', async () => {
    const to = uniqueEmail('rollback');
    await expect(
      db.transaction(async (tx) => {
        await enqueueMail(tx, { shopId: fx.mine.id, kind: 'invite', to, subject: 'Never sent', text: 'x' });
        throw new Error('the change failed');
      }),
    ).rejects.toThrow('the change failed');
    expect(await db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, to))).toEqual([]);

    const kept = await queue();
    expect((await row(kept.id)).status).toBe('pending');
    expect(kept.messageId).toMatch(/^<[0-9a-f-]{36}@[\w.-]+>$/);
  });

  test('refuses a message a mail could not carry, with the reason', async () => {
    await expect(
      db.transaction((tx) => enqueueMail(tx, { shopId: fx.mine.id, kind: 'invite', to: 'not an address', subject: 'x', text: 'x' })),
    ).rejects.toThrow('The recipient’s e-mail address is not valid.');
    await expect(
      db.transaction((tx) =>
        enqueueMail(tx, { shopId: fx.mine.id, kind: 'invite', to: 'a@example.com', subject: 'Two\r\nBcc: x@example.com', text: 'x' }),
      ),
    ).rejects.toThrow('A subject is one line.');
  });

  test('delivers text, HTML and attachments with the Message-ID fixed at enqueue', async () => {
    const to = uniqueEmail('attach');
    const { id, messageId } = await db.transaction((tx) =>
      enqueueMail(tx, {
        shopId: fx.mine.id,
        kind: 'quote',
        to,
        subject: 'Your quote',
        text: 'See the attached quote.',
        html: '<p>See the attached quote.</p>',
        attachments: [{ filename: 'quote.txt', contentType: 'text/plain', content: Buffer.from('Q-0001 rev A').toString('base64') }],
      }),
    );
    const clock = manualClock();
    const s = sender(clock);
    expect((await s.runOnce()).sent).toBeGreaterThanOrEqual(1);
    await s.stop();
    const [mail] = await caughtWith(messageId);
    expect(mail.to).toEqual([to]);
    expect(mail.subject).toBe('Your quote');
    expect(mail.text?.trim()).toBe('See the attached quote.');
    expect(mail.html).toContain('<p>See the attached quote.</p>');
    expect(mail.attachments).toEqual([{ filename: 'quote.txt', contentType: 'text/plain', size: 12 }]);
    expect((await row(id)).status).toBe('sent');
  });

  test('catcher down: the message waits with the reason, retries after the backoff, then is delivered once', async () => {
    const m = await queue();
    const clock = manualClock();
    const port = catcher.port;
    await catcher.close();
    const s = sender(clock, { backoffMs: (n) => 60_000 * n });

    expect(await s.runOnce()).toMatchObject({ claimed: 1, retrying: 1 });
    let r = await row(m.id);
    expect(r).toMatchObject({ status: 'pending', attempts: 1 });
    expect(r.lastError).toMatch(/ECONNREFUSED/);
    expect(r.nextAttemptAt.getTime()).toBe(clock.now().getTime() + 60_000);

    // Not due yet: nothing is claimed.
    clock.advance(59_000);
    expect((await s.runOnce()).claimed).toBe(0);
    clock.advance(1_000);
    expect(await s.runOnce()).toMatchObject({ claimed: 1, retrying: 1 });
    expect((await row(m.id)).attempts).toBe(2);

    catcher = await startMailCatcher({ dir, port });
    clock.advance(120_000);
    expect(await s.runOnce()).toMatchObject({ claimed: 1, sent: 1 });
    await s.stop();
    r = await row(m.id);
    expect(r).toMatchObject({ status: 'sent', attempts: 3, lastError: null });
    expect(await caughtWith(m.messageId)).toHaveLength(1);
  });

  test('a temporary 4xx is retried; after the last attempt the message is failed with the reason', async () => {
    const m = await queue();
    catcher.refuseWith(451, 'Local problem, try later');
    const clock = manualClock();
    const s = sender(clock, { maxAttempts: 2, backoffMs: () => 1_000 });
    expect(await s.runOnce()).toMatchObject({ retrying: 1 });
    clock.advance(1_000);
    expect(await s.runOnce()).toMatchObject({ failed: 1 });
    await s.stop();
    const r = await row(m.id);
    expect(r.status).toBe('failed');
    expect(r.lastError).toMatch(/^Gave up after 2 attempts: 451/);
  });

  test('a permanent 5xx: failed at once with the server’s reason, and listed among the shop’s failed mail', async () => {
    const m = await queue('Goes nowhere');
    catcher.refuseWith(550, 'No such mailbox here');
    const clock = manualClock();
    const s = sender(clock);
    expect(await s.runOnce()).toMatchObject({ failed: 1 });
    clock.advance(24 * 3600_000);
    expect((await s.runOnce()).claimed).toBe(0);
    await s.stop();
    const r = await row(m.id);
    expect(r).toMatchObject({ status: 'failed', attempts: 1 });
    expect(r.lastError).toMatch(/^Refused by the mail server: 550.*No such mailbox here/);
    const failed = await shopOutbox({ db, shopId: fx.mine.id }, { failedOnly: true });
    expect(failed.find((f) => f.id === m.id)).toMatchObject({ subject: 'Goes nowhere', status: 'failed' });
    expect(await shopOutbox({ db, shopId: fx.theirs.id })).toEqual([]);
    expect(await caughtWith(m.messageId)).toEqual([]);
  });

  test('two senders at once: every message is delivered exactly once', async () => {
    const queued = [];
    for (let i = 0; i < 24; i++) queued.push(await queue());
    const clock = manualClock();
    const a = sender(clock, { batchSize: 3 });
    const b = sender(clock, { batchSize: 3 });
    const rounds = async (s: typeof a) => {
      let total = 0;
      for (;;) {
        const r = await s.runOnce();
        if (r.claimed === 0) return total;
        total += r.sent;
      }
    };
    const [sentA, sentB] = await Promise.all([rounds(a), rounds(b)]);
    await Promise.all([a.stop(), b.stop()]);
    const caught = await listCaughtMail(dir, 1000);
    for (const m of queued) {
      expect(
        caught.filter((c) => c.messageId === m.messageId),
        m.subject,
      ).toHaveLength(1);
      expect((await row(m.id)).status).toBe('sent');
    }
    expect(sentA + sentB).toBeGreaterThanOrEqual(queued.length);
  });

  test('a crash between sending and marking: one resend with the same Message-ID, never a second', async () => {
    const m = await queue();
    const clock = manualClock();
    class Crash extends Error {}
    const crashing = sender(clock, {
      claimMs: 60_000,
      afterSend: () => {
        throw new Crash('the server stopped');
      },
    });
    await expect(crashing.runOnce()).rejects.toBeInstanceOf(Crash);
    await crashing.stop();
    expect((await row(m.id)).status).toBe('sending');
    expect(await caughtWith(m.messageId)).toHaveLength(1);

    // Another sender (the restarted server) leaves it alone while the claim lasts, then takes it over.
    const restarted = sender(clock, { claimMs: 60_000 });
    expect((await restarted.runOnce()).claimed).toBe(0);
    clock.advance(60_000);
    expect(await restarted.runOnce()).toMatchObject({ claimed: 1, sent: 1 });
    clock.advance(3600_000);
    expect((await restarted.runOnce()).claimed).toBe(0);
    await restarted.stop();
    const copies = await caughtWith(m.messageId);
    expect(copies).toHaveLength(2);
    expect(copies[0].messageId).toBe(copies[1].messageId);
    expect((await row(m.id)).status).toBe('sent');

    // A message whose resend is also cut short is not sent a third time: it is failed as uncertain.
    const n = await queue();
    const crashTwice = sender(clock, {
      claimMs: 60_000,
      afterSend: () => {
        throw new Crash('stopped again');
      },
    });
    await expect(crashTwice.runOnce()).rejects.toBeInstanceOf(Crash);
    clock.advance(60_000);
    await expect(crashTwice.runOnce()).rejects.toBeInstanceOf(Crash);
    clock.advance(60_000);
    expect(await crashTwice.runOnce()).toMatchObject({ claimed: 0 });
    await crashTwice.stop();
    const r = await row(n.id);
    expect(r.status).toBe('failed');
    expect(r.lastError).toMatch(/may have arrived/);
    expect(await caughtWith(n.messageId)).toHaveLength(2);
  });
});

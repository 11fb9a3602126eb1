import bcrypt from 'bcryptjs';
import { eq } from 'drizzle-orm';
import type { NextRequest } from 'next/server';
import { describe, expect, test } from 'vitest';
import type { Db } from '@/db/open';
import { mailOutbox, userTokens, users } from '@/db/schema';
import { hashToken, lookUpLink, requestPasswordReset, useLink } from '@/db/queries/user-links';
import * as teamRoute from '@/app/api/team/route';
import * as resendRoute from '@/app/api/team/[id]/invite/route';
import * as inviteRoute from '@/app/api/invites/[token]/route';
import * as resetsRoute from '@/app/api/password-resets/route';
import * as resetRoute from '@/app/api/password-resets/[token]/route';
import { useTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request, type TestUser } from '../support/fixtures';
import { uniqueEmail } from '../support/unique';

let db: Db;
let fx: TwoShops;
useTwoShopDatabase((app) => ({ db, fx } = app));

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;
async function call(handler: Handler, params: Record<string, string>, opts: { method?: string; body?: unknown; user?: TestUser } = {}) {
  const res = await handler(await request('/api/x', { method: 'POST', ...opts }), { params: Promise.resolve(params) });
  return { status: res.status, json: await res.json() };
}

const mailsTo = (to: string) => db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, to));
/** The link as the recipient reads it in the plain-text part. */
const linkIn = (text: string, path: string) => new RegExp(`https?://\\S+${path}/([A-Za-z0-9_-]{43})`).exec(text)?.[1];

async function invite(email = uniqueEmail('invitee')) {
  const res = await call(teamRoute.POST, {}, { user: fx.owner, body: { name: 'Ines Invited', email, role: 'cutter' } });
  expect(res.status, JSON.stringify(res.json)).toBe(201);
  const [mail] = await mailsTo(email);
  return { member: res.json, mail, token: linkIn(mail.textBody, '/welcome')! };
}

describe('team invites by link', () => {
  test('inviting queues one mail, text and HTML, with a single link whose token is stored only as its hash', async () => {
    const { member, mail, token } = await invite();
    expect(member).toMatchObject({ name: 'Ines Invited', role: 'cutter', invited: true, active: true });
    expect(mail).toMatchObject({ kind: 'invite', status: 'pending', shopId: fx.mine.id });
    expect(mail.subject).toBe('Olu Birch invited you to Birchwood Joinery on Kerfwise');
    expect(mail.textBody).toContain('Hello Ines Invited,');
    expect(mail.textBody).toContain('as a cutter');
    expect(token).toHaveLength(43);
    expect(mail.htmlBody).toContain(`/welcome/${token}`);
    // No tracking: no images, no remote resources, nothing but the one link (twice: the button and the text).
    expect(mail.htmlBody).not.toMatch(/<img|url\(|<script|<link/i);
    expect(mail.htmlBody!.match(/https?:\/\/[^\s"<]+/g)).toEqual([expect.stringContaining(token), expect.stringContaining(token)]);

    const stored = await db.select().from(userTokens).where(eq(userTokens.userId, member.id));
    expect(stored).toHaveLength(1);
    expect(stored[0].tokenHash).toBe(hashToken(token));
    expect(JSON.stringify(stored)).not.toContain(token);
    // Valid for 7 days (the lifetime chosen for invites).
    expect(stored[0].expiresAt.getTime() - stored[0].createdAt.getTime()).toBeGreaterThan(7 * 24 * 3600_000 - 60_000);
  });

  test('the link sets the password once; a second use is refused and the password stays', async () => {
    const { member, token } = await invite();
    expect(await lookUpLink(db, 'invite', token)).toMatchObject({ ok: true, name: 'Ines Invited', shopName: 'Birchwood Joinery' });
    expect((await call(inviteRoute.POST, { token }, { body: { password: 'short' } })).status).toBe(422);
    const ok = await call(inviteRoute.POST, { token }, { body: { password: 'oak-and-walnut-shelves' } });
    expect(ok.status).toBe(200);
    const [row] = await db.select().from(users).where(eq(users.id, member.id));
    expect(await bcrypt.compare('oak-and-walnut-shelves', row.passwordHash)).toBe(true);

    const again = await call(inviteRoute.POST, { token }, { body: { password: 'someone-else-entirely' } });
    expect(again).toMatchObject({ status: 410, json: { error: expect.stringMatching(/already been used/) } });
    expect(await lookUpLink(db, 'invite', token)).toEqual({ ok: false, reason: 'used' });
    const [after] = await db.select().from(users).where(eq(users.id, member.id));
    expect(after.passwordHash).toBe(row.passwordHash);
  });

  test('an expired link is refused; an unknown or malformed one is a 404', async () => {
    const { token } = await invite();
    const later = new Date(Date.now() + 8 * 24 * 3600_000);
    expect(await lookUpLink(db, 'invite', token, later)).toEqual({ ok: false, reason: 'expired' });
    await expect(useLink(db, 'invite', token, 'long-enough-password', later)).rejects.toMatchObject({ status: 410 });
    expect((await call(inviteRoute.POST, { token: 'x'.repeat(43) }, { body: { password: 'long-enough-password' } })).status).toBe(404);
    expect((await call(inviteRoute.POST, { token: 'short' }, { body: { password: 'long-enough-password' } })).status).toBe(404);
    // An invite link is not a reset link.
    expect((await call(resetRoute.POST, { token }, { body: { password: 'long-enough-password' } })).status).toBe(404);
  });

  test('resending voids the earlier link; someone with a password gets no invite', async () => {
    const email = uniqueEmail('resend');
    const first = await invite(email);
    const res = await call(resendRoute.POST, { id: first.member.id }, { user: fx.owner });
    expect(res.status).toBe(200);
    const mails = await mailsTo(email);
    expect(mails).toHaveLength(2);
    const second = mails.map((m) => linkIn(m.textBody, '/welcome')!).find((t) => t !== first.token)!;
    expect(await lookUpLink(db, 'invite', first.token)).toEqual({ ok: false, reason: 'used' });
    expect(await lookUpLink(db, 'invite', second)).toMatchObject({ ok: true });

    expect((await call(resendRoute.POST, { id: fx.cutter.id }, { user: fx.owner })).status).toBe(409);
  });

  test('the owner may still hand over a first password: no invite, no mail', async () => {
    const email = uniqueEmail('handed');
    const res = await call(
      teamRoute.POST,
      {},
      { user: fx.owner, body: { name: 'Hal Handed', email, role: 'estimator', password: 'given-in-person-123' } },
    );
    expect(res.status).toBe(201);
    expect(res.json.invited).toBe(false);
    expect(await mailsTo(email)).toEqual([]);
  });
});

describe('password reset by link', () => {
  test('the same answer for a known and an unknown address; only the known one gets a mail', async () => {
    const unknown = uniqueEmail('nobody');
    const a = await call(resetsRoute.POST, {}, { body: { email: unknown } });
    const b = await call(resetsRoute.POST, {}, { body: { email: 'CUT@birchwood.example' } });
    expect(a).toEqual(b);
    expect(a.status).toBe(202);
    expect(await mailsTo(unknown)).toEqual([]);
    const [mail] = await mailsTo('cut@birchwood.example');
    expect(mail).toMatchObject({ kind: 'password-reset', subject: 'Reset your Kerfwise password for Birchwood Joinery' });
    expect(mail.textBody).toContain('Hello Cato Birch,');
    expect(mail.htmlBody).not.toMatch(/<img|url\(|<script/i);
  });

  test('a reset link sets a new password, ends the old sessions, and works for one hour only', async () => {
    const [before] = await db.select().from(users).where(eq(users.id, fx.estimator.id));
    await requestPasswordReset(db, 'est@birchwood.example');
    const mails = await mailsTo('est@birchwood.example');
    const token = linkIn(mails[mails.length - 1].textBody, '/reset-password')!;
    expect(await lookUpLink(db, 'password-reset', token, new Date(Date.now() + 61 * 60_000))).toEqual({ ok: false, reason: 'expired' });

    expect((await call(resetRoute.POST, { token }, { body: { password: 'a-new-and-longer-one' } })).status).toBe(200);
    const [after] = await db.select().from(users).where(eq(users.id, fx.estimator.id));
    expect(await bcrypt.compare('a-new-and-longer-one', after.passwordHash)).toBe(true);
    expect(after.tokenVersion).toBe(before.tokenVersion + 1);
    expect((await call(resetRoute.POST, { token }, { body: { password: 'a-new-and-longer-one' } })).status).toBe(410);
  });

  test('a deactivated person gets no reset mail', async () => {
    const email = uniqueEmail('gone');
    await db.insert(users).values({ shopId: fx.mine.id, name: 'Gone', email, role: 'cutter', passwordHash: 'x', active: false });
    await requestPasswordReset(db, email);
    expect(await mailsTo(email)).toEqual([]);
  });
});

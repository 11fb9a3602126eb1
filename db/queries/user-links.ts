/**
 * Single-use links for team invites and password resets. The token is 32 random bytes (base64url, 43 characters)
 * and exists only in the mail; the database keeps its SHA-256. Issuing a new link for a person voids their earlier
 * unused links of the same purpose; using one voids all their others.
 */
import { createHash, randomBytes } from 'node:crypto';
import bcrypt from 'bcryptjs';
import { and, eq, isNull, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { shops, userTokens, users } from '../schema';
import { HttpError } from '@/lib/api/errors';
import { appBaseUrl } from '@/lib/mail/config';
import { enqueueMail } from '@/lib/mail/outbox';
import { inviteMail, passwordResetMail } from '@/lib/mail/templates';
import type { Role } from '@/lib/auth/permissions';
import { recordAudit } from './audit';

export type LinkPurpose = 'invite' | 'password-reset';

export const LINK_LIFETIME_MS: Record<LinkPurpose, number> = {
  invite: 7 * 24 * 3600_000,
  'password-reset': 60 * 60_000,
};

/** The password hash of someone invited who has not chosen a password yet: no password ever matches it. */
export const NO_PASSWORD_YET = '!invited';
export const hasPassword = (hash: string) => hash.startsWith('$2');

export const LINK_TOKEN = /^[A-Za-z0-9_-]{43}$/;
export const hashToken = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');

/** Where each link leads (the pages that set the password). */
export const linkPath = (purpose: LinkPurpose, token: string) => (purpose === 'invite' ? `/welcome/${token}` : `/reset-password/${token}`);

async function issue(tx: Db, user: { id: string; shopId: string }, purpose: LinkPurpose, now: Date) {
  await tx
    .update(userTokens)
    .set({ usedAt: now })
    .where(and(eq(userTokens.userId, user.id), eq(userTokens.purpose, purpose), isNull(userTokens.usedAt)));
  const token = randomBytes(32).toString('base64url');
  const expiresAt = new Date(now.getTime() + LINK_LIFETIME_MS[purpose]);
  await tx.insert(userTokens).values({ shopId: user.shopId, userId: user.id, purpose, tokenHash: hashToken(token), expiresAt });
  return { token, expiresAt, link: appBaseUrl() + linkPath(purpose, token) };
}

async function shopName(tx: Db, shopId: string) {
  const [shop] = await tx.select({ name: shops.name }).from(shops).where(eq(shops.id, shopId));
  return shop?.name ?? 'your shop';
}

/** Issues an invite link for someone who has no password yet and queues the invite mail, in the caller's transaction. */
export async function queueInvite(
  tx: Db,
  person: { id: string; shopId: string; name: string; email: string; role: Role },
  inviterName: string,
  now = new Date(),
) {
  const { link, expiresAt } = await issue(tx, person, 'invite', now);
  const mail = inviteMail({ shopName: await shopName(tx, person.shopId), inviterName, personName: person.name, role: person.role, link, expiresAt });
  return enqueueMail(tx, { shopId: person.shopId, kind: 'invite', to: person.email, ...mail });
}

/**
 * A reset link for the active person with this address, if there is one, with its mail queued. Says nothing either
 * way: the caller answers the same whether or not the address has an account.
 */
export async function requestPasswordReset(db: Db, email: string, now = new Date()): Promise<void> {
  await db.transaction(async (tx) => {
    const [person] = await tx
      .select()
      .from(users)
      .where(and(sql`lower(${users.email}) = ${email.trim().toLowerCase()}`, eq(users.active, true)))
      .limit(1);
    // (Someone who has not used their invite yet may choose a first password this way too.)
    if (!person) return;
    const { link, expiresAt } = await issue(tx, person, 'password-reset', now);
    const mail = passwordResetMail({ shopName: await shopName(tx, person.shopId), personName: person.name, link, expiresAt });
    await enqueueMail(tx, { shopId: person.shopId, kind: 'password-reset', to: person.email, ...mail });
  });
}

export type LinkState =
  | { ok: true; name: string; email: string; shopName: string; expiresAt: Date }
  | { ok: false; reason: 'unknown' | 'used' | 'expired' };

/** What a link's page shows: who it is for, or why it no longer works. */
export async function lookUpLink(db: Db, purpose: LinkPurpose, token: string, now = new Date()): Promise<LinkState> {
  if (!LINK_TOKEN.test(token)) return { ok: false, reason: 'unknown' };
  const [row] = await db
    .select({
      usedAt: userTokens.usedAt,
      expiresAt: userTokens.expiresAt,
      name: users.name,
      email: users.email,
      active: users.active,
      shopName: shops.name,
    })
    .from(userTokens)
    .innerJoin(users, eq(users.id, userTokens.userId))
    .innerJoin(shops, eq(shops.id, userTokens.shopId))
    .where(and(eq(userTokens.tokenHash, hashToken(token)), eq(userTokens.purpose, purpose)));
  if (!row || !row.active) return { ok: false, reason: 'unknown' };
  if (row.usedAt) return { ok: false, reason: 'used' };
  if (row.expiresAt <= now) return { ok: false, reason: 'expired' };
  return { ok: true, name: row.name, email: row.email, shopName: row.shopName, expiresAt: row.expiresAt };
}

export const LINK_REFUSALS: Record<'unknown' | 'used' | 'expired', string> = {
  unknown: 'This link is not valid. Check that the whole address from the mail was opened.',
  used: 'This link has already been used. Sign in with your password, or ask for a new link.',
  expired: 'This link has expired. Ask for a new one.',
};

/**
 * Uses a link: sets the person's password, ends their other sessions (token version), and voids every other link
 * of theirs — all in one transaction, with the token row locked so two tabs cannot both use it.
 */
export async function useLink(db: Db, purpose: LinkPurpose, token: string, password: string, now = new Date()): Promise<{ email: string }> {
  if (!LINK_TOKEN.test(token)) throw new HttpError(404, LINK_REFUSALS.unknown);
  const passwordHash = await bcrypt.hash(password, 10);
  return db.transaction(async (tx) => {
    const [link] = await tx
      .select()
      .from(userTokens)
      .where(and(eq(userTokens.tokenHash, hashToken(token)), eq(userTokens.purpose, purpose)))
      .for('update');
    if (!link) throw new HttpError(404, LINK_REFUSALS.unknown);
    if (link.usedAt) throw new HttpError(410, LINK_REFUSALS.used);
    if (link.expiresAt <= now) throw new HttpError(410, LINK_REFUSALS.expired);
    const [person] = await tx
      .update(users)
      .set({ passwordHash, tokenVersion: sql`${users.tokenVersion} + 1` })
      .where(and(eq(users.id, link.userId), eq(users.active, true)))
      .returning();
    if (!person) throw new HttpError(404, LINK_REFUSALS.unknown);
    await tx
      .update(userTokens)
      .set({ usedAt: now })
      .where(and(eq(userTokens.userId, person.id), isNull(userTokens.usedAt)));
    await recordAudit(tx, {
      shopId: person.shopId,
      userId: person.id,
      action: 'update',
      entity: 'user',
      entityId: person.id,
      data: { passwordSetBy: purpose },
    });
    return { email: person.email };
  });
}

import type { Scope, ShopScope } from '../scope';
import bcrypt from 'bcryptjs';
import { and, eq, ne, sql } from 'drizzle-orm';
import type { Db } from '../open';
import { users } from '../schema';
import type { TeamMember, TeamMemberInput, TeamMemberPatch } from '@/shared/schemas/user';
import { recordAudit } from './audit';
import { hasPassword, NO_PASSWORD_YET, queueInvite } from './user-links';
import { listTeam } from './users';
import { invalid, notFound, conflict } from '@/lib/errors';

const member = (u: {
  id: string;
  name: string;
  email: string;
  role: TeamMember['role'];
  active: boolean;
  passwordHash: string;
  createdAt: Date;
}): TeamMember => ({
  id: u.id,
  name: u.name,
  email: u.email,
  role: u.role,
  active: u.active,
  invited: !hasPassword(u.passwordHash),
  createdAt: u.createdAt.toISOString(),
});

export const BCRYPT_ROUNDS = 10;

export async function teamOf({ db, shopId }: ShopScope): Promise<TeamMember[]> {
  return (await listTeam({ db, shopId })).map(member);
}

/**
 * Adds a person. Without a password they are invited: a single-use link to choose one is mailed to them, queued in
 * the same transaction as their row.
 */
export async function addTeamMember({ db, shopId, userId: actorId }: Scope, input: TeamMemberInput): Promise<TeamMember> {
  const passwordHash = input.password === undefined ? NO_PASSWORD_YET : await bcrypt.hash(input.password, BCRYPT_ROUNDS);
  try {
    return await db.transaction(async (tx) => {
      const [row] = await tx.insert(users).values({ shopId, name: input.name, email: input.email, role: input.role, passwordHash }).returning();
      await recordAudit(tx, {
        shopId,
        userId: actorId,
        action: 'create',
        entity: 'user',
        entityId: row.id,
        data: { email: row.email, role: row.role, invited: input.password === undefined },
      });
      if (input.password === undefined) await queueInvite(tx, row, await actorName(tx, actorId));
      return member(row);
    });
  } catch (error) {
    if (isUniqueViolation(error)) throw invalid('That e-mail is already in use.', { email: ['That e-mail is already in use.'] });
    throw error;
  }
}

/**
 * Changes a person's role, name, password or status. Any change but the name bumps their token version so the
 * change takes effect on their next request. The shop always keeps at least one active owner.
 */
export async function updateTeamMember({ db, shopId, userId: actorId }: Scope, id: string, patch: TeamMemberPatch) {
  return db.transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(users)
      .where(and(eq(users.shopId, shopId), eq(users.id, id)))
      .for('update');
    if (!current) throw notFound('That person');

    const losesOwner = current.role === 'owner' && current.active && ((patch.role && patch.role !== 'owner') || patch.active === false);
    if (losesOwner) {
      const [{ others }] = await tx
        .select({ others: sql<number>`count(*)::int` })
        .from(users)
        .where(and(eq(users.shopId, shopId), eq(users.role, 'owner'), eq(users.active, true), ne(users.id, id)));
      if (Number(others) === 0) throw conflict('The shop needs at least one active owner. Make someone else owner first.');
    }

    const bumps = patch.role !== undefined || patch.active !== undefined || patch.password !== undefined;
    const [row] = await tx
      .update(users)
      .set({
        ...(patch.name !== undefined && { name: patch.name }),
        ...(patch.role !== undefined && { role: patch.role }),
        ...(patch.active !== undefined && { active: patch.active }),
        ...(patch.password !== undefined && { passwordHash: await bcrypt.hash(patch.password, BCRYPT_ROUNDS) }),
        ...(bumps && { tokenVersion: sql`${users.tokenVersion} + 1` }),
      })
      .where(and(eq(users.shopId, shopId), eq(users.id, id)))
      .returning();
    const { password: _secret, ...logged } = patch;
    await recordAudit(tx, {
      shopId,
      userId: actorId,
      action: 'update',
      entity: 'user',
      entityId: id,
      data: { ...logged, passwordChanged: patch.password !== undefined },
    });
    return member(row);
  });
}

/** Sends a fresh invite (voiding the earlier link) to someone who has not chosen a password yet. */
export async function resendInvite({ db, shopId, userId: actorId }: Scope, id: string): Promise<TeamMember> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(users)
      .where(and(eq(users.shopId, shopId), eq(users.id, id)))
      .for('update');
    if (!row) throw notFound('That person');
    if (!row.active) throw conflict(`${row.name} is deactivated: reactivate them first.`);
    if (hasPassword(row.passwordHash)) throw conflict(`${row.name} has already chosen a password. They can reset it from the sign-in page.`);
    await queueInvite(tx, row, await actorName(tx, actorId));
    await recordAudit(tx, { shopId, userId: actorId, action: 'update', entity: 'user', entityId: id, data: { inviteResent: true } });
    return member(row);
  });
}

async function actorName(tx: Db, actorId: string) {
  const [actor] = await tx.select({ name: users.name }).from(users).where(eq(users.id, actorId));
  return actor?.name ?? 'The shop';
}

function isUniqueViolation(error: unknown): boolean {
  const e = error as { code?: string; cause?: { code?: string } };
  return e?.code === '23505' || e?.cause?.code === '23505';
}

import type { ShopScope } from '../scope';
import { and, asc, eq, sql } from 'drizzle-orm';
import type { Db, DbHandle } from '../open';
import { ReadCache } from '../changes';
import { users } from '../schema';
import type { Role } from '@/lib/auth/permissions';

export interface SessionUser {
  id: string;
  shopId: string;
  role: Role;
  name: string;
  email: string;
  tokenVersion: number;
}

export async function findActiveUserByEmail(db: Db, email: string) {
  const [row] = await db
    .select()
    .from(users)
    .where(and(sql`lower(${users.email}) = ${email.trim().toLowerCase()}`, eq(users.active, true)))
    .limit(1);
  return row ?? null;
}

type SessionRow = SessionUser & { active: boolean };

/** Embedded database only (db/changes.ts): each user's row as last read, until a statement on users commits. */
const sessionRows = new ReadCache<SessionRow | null>(['users']);

/**
 * The user a session claims to be, as the database has them now. A session minted before a change of role,
 * password or status (older token version) or for another shop no longer counts. On the embedded database the row
 * is kept until any statement on users commits (sign-out, a role or password change, deactivation: the very next
 * request reads again); on PostgreSQL it is read on every request, as other app servers may have changed it.
 */
export async function loadSessionUser(
  handle: Pick<DbHandle, 'db' | 'changes'>,
  claims: { userId: string; shopId: string; tokenVersion: number },
): Promise<SessionUser | null> {
  const row = await sessionRows.get(handle.changes, `${claims.userId}|${claims.shopId}`, async () => {
    const [found] = await handle.db
      .select({
        id: users.id,
        shopId: users.shopId,
        role: users.role,
        name: users.name,
        email: users.email,
        tokenVersion: users.tokenVersion,
        active: users.active,
      })
      .from(users)
      .where(and(eq(users.id, claims.userId), eq(users.shopId, claims.shopId)))
      .limit(1);
    return found ?? null;
  });
  if (!row || !row.active || row.tokenVersion !== claims.tokenVersion) return null;
  const { active: _active, ...user } = row;
  return user;
}

/**
 * Ends every session the user holds (sign-out): the session version moves on, so a saved copy of the signed-out
 * cookie is refused on its next request, on every app server (each request reads the version from the database).
 */
export async function revokeSessions(db: Db, claims: { userId: string; shopId: string }): Promise<void> {
  await db
    .update(users)
    .set({ tokenVersion: sql`${users.tokenVersion} + 1` })
    .where(and(eq(users.id, claims.userId), eq(users.shopId, claims.shopId)));
}

export async function listTeam({ db, shopId }: ShopScope) {
  return db
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      role: users.role,
      active: users.active,
      passwordHash: users.passwordHash,
      createdAt: users.createdAt,
    })
    .from(users)
    .where(eq(users.shopId, shopId))
    .orderBy(asc(users.name));
}

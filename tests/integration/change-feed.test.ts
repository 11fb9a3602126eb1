/**
 * The embedded database's change feed (db/changes.ts) and the reads it lets a process keep between requests: the
 * session's user and the shop's settings. Whatever commits on users or shops — through the app's own functions or
 * a bare UPDATE — is seen on the very next read; a rolled-back change is not; on PostgreSQL (TEST_DATABASE_URL)
 * there is no feed and every read goes to the database.
 */
import { eq, sql } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { shops, users } from '@/db/schema';
import { loadSessionUser, revokeSessions } from '@/db/queries/users';
import { readShopSettings, updateShopSettings } from '@/db/queries/shops';
import * as jobsRoute from '@/app/api/jobs/route';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request } from '../support/fixtures';

let handle: DbHandle;
let fx: TwoShops;
const noParams = { params: Promise.resolve({}) };

setUpTwoShopDatabase((app) => ({ handle, fx } = app));

const claimsOf = (u: { id: string; shopId: string; tokenVersion: number }) => ({ userId: u.id, shopId: u.shopId, tokenVersion: u.tokenVersion });

async function newEstimator(email: string) {
  const [u] = await handle.db
    .insert(users)
    .values({ shopId: fx.mine.id, email, name: 'Feed Estimator', role: 'estimator', passwordHash: 'x' })
    .returning();
  return u;
}

describe('the change feed', () => {
  test('the embedded database has one; a PostgreSQL server has none, so nothing is kept between requests', () => {
    if (handle.kind === 'pglite') expect(handle.changes).toBeDefined();
    else expect(handle.changes).toBeUndefined();
  });

  test('a role changed with a bare UPDATE is seen on the next read of the session', async () => {
    const u = await newEstimator('feed.role@birchwood.example');
    expect((await loadSessionUser(handle, claimsOf(u)))?.role).toBe('estimator');
    expect((await loadSessionUser(handle, claimsOf(u)))?.role).toBe('estimator');
    await handle.db.update(users).set({ role: 'cutter' }).where(eq(users.id, u.id));
    expect((await loadSessionUser(handle, claimsOf(u)))?.role).toBe('cutter');
  });

  test('a sign-out everywhere (the session version moves on) refuses the old session on the next request', async () => {
    const u = await newEstimator('feed.signout@birchwood.example');
    const session = { id: u.id, shopId: u.shopId, role: u.role, tokenVersion: u.tokenVersion };
    expect((await jobsRoute.GET(await request('/api/jobs', { user: session }), noParams)).status).toBe(200);
    expect((await jobsRoute.GET(await request('/api/jobs', { user: session }), noParams)).status).toBe(200);
    await revokeSessions(handle.db, { userId: u.id, shopId: u.shopId });
    expect((await jobsRoute.GET(await request('/api/jobs', { user: session }), noParams)).status).toBe(401);
    expect(await loadSessionUser(handle, claimsOf(u))).toBeNull();
    expect(await loadSessionUser(handle, { ...claimsOf(u), tokenVersion: u.tokenVersion + 1 })).not.toBeNull();
  });

  test('a deactivation inside a transaction is seen once it commits, and a rolled-back one never', async () => {
    const u = await newEstimator('feed.tx@birchwood.example');
    expect(await loadSessionUser(handle, claimsOf(u))).not.toBeNull();
    await handle.db
      .transaction(async (tx) => {
        await tx.update(users).set({ active: false }).where(eq(users.id, u.id));
        tx.rollback();
      })
      .catch(() => undefined);
    expect(await loadSessionUser(handle, claimsOf(u))).not.toBeNull();
    await handle.db.transaction(async (tx) => {
      await tx.update(users).set({ active: false }).where(eq(users.id, u.id));
    });
    expect(await loadSessionUser(handle, claimsOf(u))).toBeNull();
  });

  test("the shop's settings: a saved change (and a bare UPDATE) is read back at once; callers get copies", async () => {
    const before = await readShopSettings(handle, fx.mine.id);
    expect(before.timeZone).toBeTruthy();
    before!.name = 'changed by a caller';
    expect((await readShopSettings(handle, fx.mine.id)).name).not.toBe('changed by a caller');
    await updateShopSettings({ db: handle.db, shopId: fx.mine.id, userId: fx.owner.id }, { timeZone: 'America/Chicago' });
    expect((await readShopSettings(handle, fx.mine.id)).timeZone).toBe('America/Chicago');
    await handle.db
      .update(shops)
      .set({ name: sql`${shops.name} || ' & Sons'` })
      .where(eq(shops.id, fx.mine.id));
    expect((await readShopSettings(handle, fx.mine.id)).name).toMatch(/ & Sons$/);
    // The other shop's settings are its own.
    expect((await readShopSettings(handle, fx.theirs.id)).name).not.toMatch(/ & Sons$/);
  });
});

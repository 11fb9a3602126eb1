/**
 * The hot reads of every page view, prepared once (db/prepared.ts: the jobs list, a plan) and the session cookie's
 * decode, remembered per token (server/auth/token.ts): the prepared statement answers exactly what the same SQL
 * through drizzle answers, sees every committed write on the next read (it keeps a statement, never rows), recovers
 * from an error, never lands inside someone else's open transaction on the embedded database, and a saved cookie is
 * still refused on the very next request after a sign-out or seen with its new role after a change.
 */
import { eq, sql } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { PreparedRead } from '@/db/prepared';
import { customers, jobs, parts, users } from '@/db/schema';
import { listJobsPage } from '@/db/queries/jobs';
import { revokeSessions } from '@/db/queries/users';
import * as jobsRoute from '@/app/api/jobs/route';
import { jobListQuerySchema } from '@/shared/schemas/job-list';
import { BROWSER_HEADERS, sessionCookie } from '../support/fixtures';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { NextRequest } from 'next/server';

let handle: DbHandle;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ handle, fx } = app));

const noParams = { params: Promise.resolve({}) };
const view = (raw: Partial<Record<string, string>> = {}) => jobListQuerySchema.parse(raw);

/** A request carrying exactly this cookie (a browser sends the same one again and again). */
function withCookie(cookie: string, init: { method?: string; body?: unknown } = {}) {
  const headers = new Headers(BROWSER_HEADERS);
  headers.set('cookie', cookie);
  if (init.body !== undefined) headers.set('content-type', 'application/json');
  return new NextRequest('http://localhost/api/jobs', {
    method: init.method ?? 'GET',
    headers,
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
  });
}

describe('prepared reads', () => {
  test('the jobs list through the prepared statement is what the same SQL through drizzle gives, for every kind of view', async () => {
    const [ada] = await handle.db.insert(customers).values({ shopId: fx.mine.id, name: 'Ada Prepared' }).returning();
    const made = await handle.db
      .insert(jobs)
      .values([
        { shopId: fx.mine.id, name: 'Prepared pantry', customerId: ada.id, status: 'quoted', dueDate: '2027-02-01' },
        { shopId: fx.mine.id, name: 'prepared vanity', status: 'archived' },
        { shopId: fx.mine.id, name: 'Prepared 50%_off bench', customerId: ada.id, acceptedAt: new Date('2026-11-02T10:11:12.345Z') },
      ])
      .returning();
    await handle.db.insert(parts).values([
      { shopId: fx.mine.id, jobId: made[0].id, label: 'Side', quantity: 2, length: 700, width: 560, thickness: 18, material: 'Walnut ply' },
      { shopId: fx.mine.id, jobId: made[0].id, label: 'Top', quantity: 1, length: 900, width: 560, thickness: 18, material: 'Birch ply' },
    ]);
    const views = [
      {},
      { sort: 'name.asc' },
      { sort: 'customer.desc' },
      { sort: 'parts.desc', size: '50' },
      { sort: 'due.asc' },
      { sort: 'status.asc' },
      { status: 'all' },
      { status: 'archived' },
      { status: 'quoted' },
      { q: 'walnut' },
      { q: '50%_' },
      { customer: 'ada prepared' },
      { page: '9' },
    ];
    for (const raw of views) {
      const q = view(raw);
      const prepared = await listJobsPage({ db: handle.db, shopId: fx.mine.id }, q);
      // A transaction has no client of its own: the same statement goes through drizzle's execute.
      const plain = await handle.db.transaction((tx) => listJobsPage({ db: tx, shopId: fx.mine.id }, q));
      expect(prepared, JSON.stringify(raw)).toEqual(plain);
    }
    const page = await listJobsPage({ db: handle.db, shopId: fx.mine.id }, view({ q: 'prepared', status: 'all', sort: 'name.asc' }));
    expect(page.jobs.map((j) => j.name)).toEqual(['Prepared 50%_off bench', 'Prepared pantry', 'prepared vanity']);
    const pantry = page.jobs.find((j) => j.name === 'Prepared pantry')!;
    expect(pantry).toMatchObject({
      customer: 'Ada Prepared',
      status: 'quoted',
      dueDate: '2027-02-01',
      partCount: 3,
      materials: ['Birch ply', 'Walnut ply'],
    });
    expect(pantry.createdAt).toBe(made[0].createdAt.toISOString());
    expect(page.jobs.find((j) => j.name.startsWith('Prepared 50'))!.acceptedAt).toBe('2026-11-02T10:11:12.345Z');
    // Another shop's jobs never show.
    expect((await listJobsPage({ db: handle.db, shopId: fx.theirs.id }, view({ q: 'prepared', status: 'all' }))).total).toBe(0);
  });

  test('a committed write is in the very next prepared read: the statement is kept, never its rows', async () => {
    const before = await listJobsPage({ db: handle.db, shopId: fx.mine.id }, view({ q: 'fresh write' }));
    expect(before.total).toBe(0);
    const [job] = await handle.db.insert(jobs).values({ shopId: fx.mine.id, name: 'Fresh write wardrobe' }).returning();
    expect((await listJobsPage({ db: handle.db, shopId: fx.mine.id }, view({ q: 'fresh write' }))).jobs.map((j) => j.name)).toEqual([
      'Fresh write wardrobe',
    ]);
    await handle.db.update(jobs).set({ name: 'Fresh write armoire' }).where(eq(jobs.id, job.id));
    expect((await listJobsPage({ db: handle.db, shopId: fx.mine.id }, view({ q: 'fresh write' }))).jobs.map((j) => j.name)).toEqual([
      'Fresh write armoire',
    ]);
  });

  test('a statement that fails is refused with the database’s error, and the next run and other queries work', async () => {
    const ratio = new PreparedRead<{ by: number }>((v) => sql`select 12 / ${v('by')}::int as q`);
    await expect(ratio.rows(handle.db, { by: 0 })).rejects.toThrow(/division by zero/);
    expect(await ratio.rows(handle.db, { by: 4 })).toEqual([{ q: 3 }]);
    await expect(ratio.rows(handle.db, { by: 0 })).rejects.toThrow(/division by zero/);
    expect(await ratio.rows(handle.db, { by: 3 })).toEqual([{ q: 4 }]);
    const [{ n }] = await handle.db.select({ n: sql<number>`count(*)::int` }).from(users);
    expect(n).toBeGreaterThan(0);
  });

  test('a statement another copy of the module prepared (Next.js bundles it per route and page) still runs', async () => {
    const q = view({ sort: 'name.desc' });
    const first = await listJobsPage({ db: handle.db, shopId: fx.mine.id }, q);
    // What a second bundle sees: no record of what this database has prepared.
    delete (globalThis as { __kerfwisePrepared?: unknown }).__kerfwisePrepared;
    expect(await listJobsPage({ db: handle.db, shopId: fx.mine.id }, q)).toEqual(first);
    expect(await listJobsPage({ db: handle.db, shopId: fx.mine.id }, q)).toEqual(first);
  });

  test('on the embedded database a prepared read waits for an open transaction: it sees the commit, never a rollback', async () => {
    if (handle.kind !== 'pglite') return;
    const reads: Promise<{ total: number }>[] = [];
    await handle.db
      .transaction(async (tx) => {
        await tx.insert(jobs).values({ shopId: fx.mine.id, name: 'Rolled back hutch' });
        reads.push(listJobsPage({ db: handle.db, shopId: fx.mine.id }, view({ q: 'rolled back hutch' })));
        tx.rollback();
      })
      .catch(() => undefined);
    expect((await reads[0]).total).toBe(0);
    await handle.db.transaction(async (tx) => {
      await tx.insert(jobs).values({ shopId: fx.mine.id, name: 'Committed hutch' });
      reads.push(listJobsPage({ db: handle.db, shopId: fx.mine.id }, view({ q: 'committed hutch' })));
    });
    expect((await reads[1]).total).toBe(1);
  });
});

describe('the same session cookie, again and again', () => {
  test('is refused on the very next request after a sign-out', async () => {
    const [u] = await handle.db
      .insert(users)
      .values({ shopId: fx.mine.id, email: 'replay.signout@birchwood.example', name: 'Replay Estimator', role: 'estimator', passwordHash: 'x' })
      .returning();
    const cookie = await sessionCookie({ id: u.id, shopId: u.shopId, role: u.role, tokenVersion: u.tokenVersion });
    expect((await jobsRoute.GET(withCookie(cookie), noParams)).status).toBe(200);
    expect((await jobsRoute.GET(withCookie(cookie), noParams)).status).toBe(200);
    await revokeSessions(handle.db, { userId: u.id, shopId: u.shopId });
    expect((await jobsRoute.GET(withCookie(cookie), noParams)).status).toBe(401);
    expect((await jobsRoute.GET(withCookie(cookie), noParams)).status).toBe(401);
  });

  test('carries a new role from the very next request', async () => {
    const [u] = await handle.db
      .insert(users)
      .values({ shopId: fx.mine.id, email: 'replay.role@birchwood.example', name: 'Replay Role', role: 'estimator', passwordHash: 'x' })
      .returning();
    const cookie = await sessionCookie({ id: u.id, shopId: u.shopId, role: u.role, tokenVersion: u.tokenVersion });
    const create = () => jobsRoute.POST(withCookie(cookie, { method: 'POST', body: { name: 'Replay job' } }), noParams);
    expect((await create()).status).toBe(201);
    await handle.db.update(users).set({ role: 'cutter' }).where(eq(users.id, u.id));
    expect((await create()).status).toBe(403);
    expect((await jobsRoute.GET(withCookie(cookie), noParams)).status).toBe(200);
  });
});

import { eq } from 'drizzle-orm';
import type { NextRequest } from 'next/server';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { provideDatabase } from '@/db/client';
import type { DbHandle } from '@/db/open';
import { jobs, saws, shops, users } from '@/db/schema';
import { listSaws } from '@/db/queries/saws';
import { optimize, validatePlan } from '@/lib/nesting';
import { seedDemoShop } from '@/seeds/demo-shop';
import * as jobPlans from '@/app/api/jobs/[id]/plans/route';
import * as nestRequestRoute from '@/app/api/jobs/[id]/nest-request/route';
import * as planRoute from '@/app/api/plans/[id]/route';
import { createTestDatabase } from '../support/test-db';
import { request, TEST_SECRET, type TestUser } from '../support/fixtures';

process.env.NEXTAUTH_SECRET = TEST_SECRET;

let handle: DbHandle;
let estimator: TestUser;
let jobId: string;
let shopId: string;

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
async function call(handler: Handler, url: string, id: string, user: TestUser, init: { method?: string; body?: unknown } = {}) {
  const res = await handler(await request(url, { ...init, user }), { params: Promise.resolve({ id }) });
  return { status: res.status, body: await res.json() };
}

beforeAll(async () => {
  handle = await createTestDatabase();
  provideDatabase(handle);
  ({ shopId } = await seedDemoShop(handle.db));
  const [u] = await handle.db.select().from(users).where(eq(users.role, 'estimator'));
  estimator = { id: u.id, shopId, role: u.role, tokenVersion: u.tokenVersion };
  [{ id: jobId }] = await handle.db.select({ id: jobs.id }).from(jobs).where(eq(jobs.name, 'Hollis kitchen'));
});
afterAll(() => handle.close());

describe('a plan nested on the shop’s saws', () => {
  test('is judged against the saws’ profiles and keeps them: every step names the saw it is made on', async () => {
    const [table, track] = await listSaws({ db: handle.db, shopId });
    const { body: offered } = await call(nestRequestRoute.GET, `/api/jobs/${jobId}/nest-request`, jobId, estimator);
    const stockIds = offered.stock.map((s: { id: string }) => s.id);
    const { updatedAt: _a, ...saw } = table;
    const { updatedAt: _b, ...breakdownSaw } = track;
    const req = {
      ...offered,
      settings: { ...offered.settings, timeBudgetMs: 0, saw, breakdownSaw, kerf: Math.max(offered.settings.kerf, saw.kerf) },
    };
    const plan = await optimize(req);
    expect(validatePlan(req, plan)).toEqual([]);
    const res = await call(jobPlans.POST, `/api/jobs/${jobId}/plans`, jobId, estimator, {
      method: 'POST',
      body: { name: 'On the saws', settings: { timeBudgetMs: 0, sawId: table.id, breakdownSawId: track.id }, stockIds, plan },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const got = await call(planRoute.GET, `/api/plans/${res.body.id}`, res.body.id, estimator);
    expect(got.body.request.settings).toMatchObject({ saw: { name: 'Cabinet saw', ripCapacity: 762 }, breakdownSaw: { name: 'Track saw' } });
    const named = new Set(got.body.document.pieces.flatMap((p: { sawOrder: { saw: string }[] }) => p.sawOrder.map((s) => s.saw)));
    expect([...named].sort()).toEqual(['Cabinet saw', 'Track saw']);
  });

  test('a plan nested without the breakdown saw is refused for the saw alone when it asks more than the saw can do (422)', async () => {
    const [table, track] = await listSaws({ db: handle.db, shopId });
    const { body: offered } = await call(nestRequestRoute.GET, `/api/jobs/${jobId}/nest-request`, jobId, estimator);
    const stockIds = offered.stock.map((s: { id: string }) => s.id);
    const { updatedAt: _a, ...saw } = table;
    const { updatedAt: _b, ...breakdownSaw } = track;
    const plan = await optimize({
      ...offered,
      settings: { ...offered.settings, timeBudgetMs: 0, saw, breakdownSaw, kerf: Math.max(offered.settings.kerf, saw.kerf) },
    });
    // Saved as if for the cabinet saw alone: its steps on the track saw name a saw this nest does not have.
    const res = await call(jobPlans.POST, `/api/jobs/${jobId}/plans`, jobId, estimator, {
      method: 'POST',
      body: { settings: { timeBudgetMs: 0, sawId: table.id }, stockIds, plan },
    });
    expect(res.status).toBe(422);
    expect(res.body.fields.plan.join(' ')).toContain('is not a saw of this nest');
  });

  test('another shop’s saw cannot be chosen (422), and nothing is saved', async () => {
    const [other] = await handle.db.insert(shops).values({ name: 'Elsewhere Joinery' }).returning();
    const [foreign] = await handle.db
      .insert(saws)
      .values({ shopId: other.id, kind: 'table-saw', name: 'Their saw', kerf: 3, minFenceWidth: 25.4 })
      .returning();
    const { body: offered } = await call(nestRequestRoute.GET, `/api/jobs/${jobId}/nest-request`, jobId, estimator);
    const stockIds = offered.stock.map((s: { id: string }) => s.id);
    const plan = await optimize({ ...offered, settings: { ...offered.settings, timeBudgetMs: 0 } });
    const res = await call(jobPlans.POST, `/api/jobs/${jobId}/plans`, jobId, estimator, {
      method: 'POST',
      body: { settings: { timeBudgetMs: 0, sawId: foreign.id }, stockIds, plan },
    });
    expect(res.status).toBe(422);
    expect(res.body.fields).toHaveProperty('sawId');
  });
});

import { and, eq } from 'drizzle-orm';
import type { NextRequest } from 'next/server';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { provideDatabase } from '@/db/client';
import type { DbHandle } from '@/db/open';
import { jobs, plans, users } from '@/db/schema';
import { optimize, readPlan, validatePlan, type NestRequestInput, type Plan } from '@/lib/nesting';
import { sameStock, usableRect } from '@/lib/nesting/stock-rules';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { seedDemoShop } from '@/seeds/demo-shop';
import * as jobPlans from '@/app/api/jobs/[id]/plans/route';
import * as nestRequestRoute from '@/app/api/jobs/[id]/nest-request/route';
import * as planRoute from '@/app/api/plans/[id]/route';
import { createTestDatabase } from '../support/test-db';
import { request, TEST_SECRET, type TestUser } from '../support/fixtures';

process.env.NEXTAUTH_SECRET = TEST_SECRET;

let handle: DbHandle;
let estimator: TestUser;
let cutter: TestUser;
let jobId: string;

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
async function call(handler: Handler, url: string, id: string, user: TestUser, init: { method?: string; body?: unknown } = {}) {
  const res = await handler(await request(url, { ...init, user }), { params: Promise.resolve({ id }) });
  return { status: res.status, body: await res.json() };
}

beforeAll(async () => {
  handle = await createTestDatabase();
  provideDatabase(handle);
  const { shopId } = await seedDemoShop(handle.db);
  const people = await handle.db.select().from(users).where(eq(users.shopId, shopId));
  const as = (role: string): TestUser => {
    const u = people.find((p) => p.role === role)!;
    return { id: u.id, shopId, role: u.role, tokenVersion: u.tokenVersion };
  };
  [estimator, cutter] = [as('estimator'), as('cutter')];
  // The demo kitchen by name (not the first row the database happens to return).
  [{ id: jobId }] = await handle.db
    .select({ id: jobs.id })
    .from(jobs)
    .where(and(eq(jobs.shopId, shopId), eq(jobs.name, 'Hollis kitchen')));
});
afterAll(() => handle.close());

/** Nest as the page does: the request from the API, a stock choice, the engine (no time budget: deterministic). */
async function nest(): Promise<{ request: NestRequestInput; plan: Plan; stockIds: string[] }> {
  const { body: offered } = await call(nestRequestRoute.GET, `/api/jobs/${jobId}/nest-request`, jobId, estimator);
  const stockIds = offered.stock.map((s: { id: string }) => s.id);
  const request = { ...offered, settings: { ...offered.settings, timeBudgetMs: 0 } };
  return { request, plan: await optimize(request), stockIds };
}

async function saveDraft() {
  const { plan, stockIds } = await nest();
  const res = await call(jobPlans.POST, `/api/jobs/${jobId}/plans`, jobId, estimator, {
    method: 'POST',
    body: { name: 'Bench test', settings: { timeBudgetMs: 0 }, stockIds, plan },
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { id: res.body.id as string, updatedAt: res.body.updatedAt as string, plan };
}

describe('plan routes', () => {
  test('a Nest saved as a draft is listed with its status and read back as it was nested', async () => {
    const { id, plan } = await saveDraft();
    const list = await call(jobPlans.GET, `/api/jobs/${jobId}/plans`, jobId, estimator);
    expect(list.body.find((p: { id: string }) => p.id === id)).toMatchObject({ status: 'draft', name: 'Bench test', pieces: plan.pieces.length });
    const got = await call(planRoute.GET, `/api/plans/${id}`, id, estimator);
    expect(got.status).toBe(200);
    expect(readPlan(got.body.document)).toEqual(plan);
    // Sent as stored (it was checked when saved): the same document without going through readPlan.
    expect(got.body.document).toEqual(plan);
    expect(validatePlan(got.body.request, got.body.document)).toEqual([]);
    // The version column says what the document says, so a read knows it without opening the document.
    const [row] = await handle.db.select({ version: plans.version }).from(plans).where(eq(plans.id, id));
    expect(row.version).toBe(plan.version);
  });

  test('a tampered plan is refused with its violations, and nothing is stored', async () => {
    const { plan, stockIds } = await nest();
    const tampered = structuredClone(plan);
    const [a, b] = tampered.pieces[0].placements;
    Object.assign(b, { x: a.x, y: a.y }); // two parts on the same spot
    const res = await call(jobPlans.POST, `/api/jobs/${jobId}/plans`, jobId, estimator, {
      method: 'POST',
      body: { settings: { timeBudgetMs: 0 }, stockIds, plan: tampered },
    });
    expect(res.status).toBe(422);
    expect(res.body.fields.plan.join('\n')).toMatch(/overlap/);
    const dropped = structuredClone(plan);
    dropped.pieces[0].placements.pop();
    const missing = await call(jobPlans.POST, `/api/jobs/${jobId}/plans`, jobId, estimator, {
      method: 'POST',
      body: { settings: { timeBudgetMs: 0 }, stockIds, plan: dropped },
    });
    expect(missing.status).toBe(422);
    expect(missing.body.fields.plan.join('\n')).toMatch(/neither placed nor reported/);
  });

  test('stock that is not on offer is refused by name', async () => {
    const { plan } = await nest();
    const res = await call(jobPlans.POST, `/api/jobs/${jobId}/plans`, jobId, estimator, {
      method: 'POST',
      body: { stockIds: ['stock:00000000-0000-4000-8000-000000000000'], plan },
    });
    expect(res.status).toBe(422);
    expect(res.body.fields.stockIds[0]).toMatch(/not on offer/);
  });

  test('an edited draft (a part moved onto a bought sheet) is stored with its cuts rebuilt; an overlapping edit is refused', async () => {
    const { id, updatedAt, plan } = await saveDraft();
    const saved = await call(planRoute.GET, `/api/plans/${id}`, id, estimator);
    const req = nestRequestSchema.parse(saved.body.request);
    const edited: Plan = structuredClone(plan);
    const moved = edited.pieces[0].placements.pop()!;
    const buy = req.stock.find((s) => s.count === null && sameStock(s, edited.pieces[0]) && s.length >= moved.w && s.width >= moved.h)!;
    const trim = req.settings.trim;
    const u = usableRect(buy, trim);
    edited.pieces.push({
      stockId: buy.id,
      kind: buy.kind,
      length: buy.length,
      width: buy.width,
      thickness: buy.thickness,
      material: buy.material,
      trim,
      placements: [{ ...moved, x: u.x, y: u.y }],
    });
    // The bench sends bare placements; the server rebuilds tree and saw order.
    for (const p of edited.pieces) {
      delete p.tree;
      delete p.sawOrder;
    }

    const overlap = structuredClone(edited);
    const [a, b] = overlap.pieces[0].placements;
    Object.assign(b, { x: a.x + 1, y: a.y + 1 });
    const refused = await call(planRoute.PUT, `/api/plans/${id}`, id, estimator, {
      method: 'PUT',
      body: { plan: overlap, baseUpdatedAt: updatedAt },
    });
    expect(refused.status).toBe(422);
    expect(refused.body.fields.plan.some((m: string) => /overlap/.test(m))).toBe(true);

    const ok = await call(planRoute.PUT, `/api/plans/${id}`, id, estimator, { method: 'PUT', body: { plan: edited, baseUpdatedAt: updatedAt } });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    const [row] = await handle.db.select().from(plans).where(eq(plans.id, id));
    const stored = readPlan(row.document);
    expect(stored.pieces.at(-1)!.placements[0]).toMatchObject({ partId: moved.partId, instance: moved.instance, x: u.x, y: u.y });
    expect(stored.pieces.every((p) => p.sawOrder && p.sawOrder.length > 0)).toBe(true);
    expect(validatePlan(req, stored)).toEqual([]);

    // The bench that loaded the older version may not overwrite the newer one.
    const stale = await call(planRoute.PUT, `/api/plans/${id}`, id, estimator, { method: 'PUT', body: { plan: edited, baseUpdatedAt: updatedAt } });
    expect(stale.status).toBe(409);
  });

  test('a released plan cannot be edited, and a cutter sees it without prices', async () => {
    const [released] = await handle.db.select().from(plans).where(eq(plans.status, 'released'));
    const res = await call(planRoute.PUT, `/api/plans/${released.id}`, released.id, estimator, { method: 'PUT', body: { plan: released.document } });
    expect(res.status).toBe(409);
    const seen = await call(planRoute.GET, `/api/plans/${released.id}`, released.id, cutter);
    expect(seen.status).toBe(200);
    expect(JSON.stringify(seen.body).match(/"cost(Each|Cents)?":/g), JSON.stringify(seen.body).slice(0, 300)).toBeNull();
    const list = await call(jobPlans.GET, `/api/jobs/${released.jobId}/plans`, released.jobId, cutter);
    expect(list.body.every((p: { status: string }) => p.status !== 'draft')).toBe(true);
  });
});

/**
 * The shop's day through the real route handlers, for integration tests: a job with a cut list and a sheet size of
 * its own, a Nest saved the way the Nest screen saves it (request from the server, the engine with no time budget so
 * the plan is the same every run), release, ticks, done and cancel.
 */
import { eq } from 'drizzle-orm';
import type { NextRequest } from 'next/server';
import type { Db } from '@/db/open';
import { customers, jobs, parts, stockItems, stockMovements } from '@/db/schema';
import * as jobRoute from '@/app/api/jobs/[id]/route';
import * as jobPlans from '@/app/api/jobs/[id]/plans/route';
import * as nestRequestRoute from '@/app/api/jobs/[id]/nest-request/route';
import * as recutsRoute from '@/app/api/jobs/[id]/recuts/route';
import * as releaseRoute from '@/app/api/plans/[id]/release/route';
import * as cancelRoute from '@/app/api/plans/[id]/cancel/route';
import * as doneRoute from '@/app/api/plans/[id]/done/route';
import * as stepsRoute from '@/app/api/plans/[id]/steps/route';
import * as cancelRecutRoute from '@/app/api/recuts/[id]/cancel/route';
import { optimize, type Plan } from '@/lib/nesting';
import { nestRequestSchema, type NestRequestInput } from '@/shared/schemas/nesting';
import type { FinishPlanInput } from '@/shared/schemas/stock';
import type { RecutView } from '@/shared/schemas/recut';
import type { JobStatus } from '@/shared/schemas/job';
import { request, type TestUser } from './fixtures';
import { nextNumber } from './unique';

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

// An answer's body is whatever the route sent; each test reads the fields it asserts.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export interface Answer<T = any> {
  status: number;
  body: T;
}

/** Calls a route handler as `user`, with `id` as the path parameter. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export async function call<T = any>(
  handler: unknown,
  url: string,
  id: string,
  user: TestUser,
  init: { method?: string; body?: unknown } = {},
): Promise<Answer<T>> {
  const res = await (handler as Handler)(await request(url, { method: init.method ?? 'GET', body: init.body, user }), {
    params: Promise.resolve({ id }),
  });
  return { status: res.status, body: await res.json() };
}

export interface PartRow {
  label: string;
  quantity: number;
  length: number;
  width: number;
  grain?: 'along-length' | 'any';
}

/**
 * A job of its own in `shopId` with these parts, in a material no other test uses, and a sheet size of it on the
 * rack (its opening count in the ledger).
 */
export async function jobWithSheet(
  db: Db,
  shopId: string,
  {
    parts: rows,
    onHand = 4,
    status = 'quoting' as JobStatus,
    acceptedAt = null as Date | null,
    customerEmail = null as string | null,
  }: { parts: PartRow[]; onHand?: number; status?: JobStatus; acceptedAt?: Date | null; customerEmail?: string | null },
) {
  const material = `Day ply ${nextNumber()}`;
  const [customer] = customerEmail
    ? await db
        .insert(customers)
        .values({ shopId, name: `Customer for ${material}`, email: customerEmail })
        .returning()
    : [];
  const [job] = await db
    .insert(jobs)
    .values({ shopId, name: `Job in ${material}`, status, acceptedAt, customerId: customer?.id ?? null })
    .returning();
  await db.insert(parts).values(
    rows.map((p, i) => ({
      shopId,
      jobId: job.id,
      label: p.label,
      quantity: p.quantity,
      length: p.length,
      width: p.width,
      thickness: 18,
      material,
      grain: p.grain ?? 'along-length',
      sort: i,
    })),
  );
  const [sheet] = await db
    .insert(stockItems)
    .values({ shopId, kind: 'sheet', material, nominalThickness: '18 mm', thickness: 18, length: 2440, width: 1220, onHand, costCents: 6000 })
    .returning();
  if (onHand) await db.insert(stockMovements).values({ shopId, kind: 'received', stockItemId: sheet.id, quantity: onHand, reason: 'Opening count' });
  return { job, sheet, material };
}

/** What the Nest screen does: reads the request, nests it in the engine, saves the result as a draft. */
export async function nestAndSave(
  user: TestUser,
  jobId: string,
  { for: nestFor = 'cut-list', name = 'Plan' }: { for?: 'cut-list' | 'recuts'; name?: string } = {},
) {
  const offered = await call<NestRequestInput>(nestRequestRoute.GET, `/api/jobs/${jobId}/nest-request?for=${nestFor}`, jobId, user);
  if (offered.status !== 200) throw new Error(`nest request: ${offered.status} ${JSON.stringify(offered.body)}`);
  const settings = { timeBudgetMs: 0, preferOffcuts: true };
  const plan: Plan = await optimize(nestRequestSchema.parse({ ...offered.body, settings: { ...offered.body.settings, ...settings } }));
  const saved = await call<{ id: string }>(jobPlans.POST, `/api/jobs/${jobId}/plans`, jobId, user, {
    method: 'POST',
    body: { name, settings, stockIds: offered.body.stock.map((s) => s.id), for: nestFor, plan },
  });
  if (saved.status !== 201) throw new Error(`save: ${saved.status} ${JSON.stringify(saved.body)}`);
  return { id: saved.body.id, plan, request: offered.body };
}

export const release = (user: TestUser, planId: string) => call(releaseRoute.POST, `/api/plans/${planId}/release`, planId, user, { method: 'POST' });
export const cancel = (user: TestUser, planId: string) => call(cancelRoute.POST, `/api/plans/${planId}/cancel`, planId, user, { method: 'POST' });
export const finish = (user: TestUser, planId: string, body: FinishPlanInput = {}) =>
  call(doneRoute.POST, `/api/plans/${planId}/done`, planId, user, { method: 'POST', body });
export const tick = (user: TestUser, planId: string, step: { piece: number; step: number }) =>
  call(stepsRoute.POST, `/api/plans/${planId}/steps`, planId, user, { method: 'POST', body: step });
export const editJob = (user: TestUser, jobId: string, body: unknown) =>
  call(jobRoute.PATCH, `/api/jobs/${jobId}`, jobId, user, { method: 'PATCH', body });
export const deleteJob = (user: TestUser, jobId: string) => call(jobRoute.DELETE, `/api/jobs/${jobId}`, jobId, user, { method: 'DELETE' });
export const recutList = (user: TestUser, jobId: string) => call<RecutView[]>(recutsRoute.GET, `/api/jobs/${jobId}/recuts`, jobId, user);
export const cancelRecut = (user: TestUser, recutId: string, reason: string) =>
  call(cancelRecutRoute.POST, `/api/recuts/${recutId}/cancel`, recutId, user, { method: 'POST', body: { reason } });

/** The job's status as its page reads it. */
export async function jobStatus(user: TestUser, jobId: string): Promise<JobStatus> {
  const res = await call(jobRoute.GET, `/api/jobs/${jobId}`, jobId, user);
  return res.body.status;
}

/** The sheet's counts now: on hand, reserved and free. */
export async function counts(db: Db, sheetId: string) {
  const [s] = await db.select().from(stockItems).where(eq(stockItems.id, sheetId));
  return { onHand: s.onHand, reserved: s.reserved, free: s.onHand - s.reserved };
}

/** The first placement of the plan, as the finish form names a damaged part. */
export function firstPart(plan: Plan) {
  const piece = plan.pieces.findIndex((p) => p.placements.length > 0);
  const pl = plan.pieces[piece].placements[0];
  return { piece, partId: pl.partId, instance: pl.instance, w: pl.w, h: pl.h };
}

import { PDFDocument } from 'pdf-lib';
import { and, eq } from 'drizzle-orm';
import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { auditEvents, plans, sawSteps } from '@/db/schema';
import * as steps from '@/app/api/plans/[id]/steps/route';
import * as pdf from '@/app/api/plans/[id]/saw-order-pdf/route';
import * as tagsPdf from '@/app/api/plans/[id]/tags-pdf/route';
import { useTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request, type TestUser } from '../support/fixtures';
import { releasedPlan } from './authz/saw-order';

let handle: DbHandle;
let fx: TwoShops;

useTwoShopDatabase((app) => ({ handle, fx } = app));

type Handler = (req: Request, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;
async function call(handler: Handler, planId: string, user: TestUser, method: string, body?: unknown) {
  const res = await handler(await request(`/api/plans/${planId}/steps`, { method, body, user }), { params: Promise.resolve({ id: planId }) });
  return { status: res.status, body: res.headers.get('content-type')?.includes('json') ? await res.json() : null, res };
}
const tick = (id: string, user: TestUser, body: unknown) => call(steps.POST as Handler, id, user, 'POST', body);
const untick = (id: string, user: TestUser, body: unknown) => call(steps.DELETE as Handler, id, user, 'DELETE', body);
const read = (id: string, user: TestUser) => call(steps.GET as Handler, id, user, 'GET');
const plan = (status?: 'draft' | 'released' | 'cutting' | 'done') => releasedPlan({ db: handle.db, mine: fx.mine, myJob: fx.myJob }, status);

describe('ticking saw-order steps', () => {
  test('the first tick records who and when and moves a released plan to cutting', async () => {
    const { id } = await plan();
    const before = Date.now();
    const res = await tick(id, fx.cutter, { piece: 0, step: 1 });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('cutting');
    expect(res.body.ticks).toHaveLength(1);
    expect(res.body.ticks[0]).toMatchObject({ piece: 0, step: 1, doneBy: 'Cato Birch' });
    expect(Date.parse(res.body.ticks[0].doneAt)).toBeGreaterThanOrEqual(before - 5000);
    const [row] = await handle.db.select({ status: plans.status }).from(plans).where(eq(plans.id, id));
    expect(row.status).toBe('cutting');
    const audit = await handle.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityId, id), eq(auditEvents.action, 'tick')));
    expect(audit).toHaveLength(1);
  });

  test('ticking the same step again changes nothing: one row, the first person and time kept', async () => {
    const { id } = await plan();
    const first = await tick(id, fx.cutter, { piece: 0, step: 1 });
    const again = await tick(id, fx.owner, { piece: 0, step: 1 });
    expect(again.status).toBe(200);
    expect(again.body.ticks).toEqual(first.body.ticks);
    expect(await handle.db.select().from(sawSteps).where(eq(sawSteps.planId, id))).toHaveLength(1);
  });

  test('two cutters ticking every step at once lose no tick', async () => {
    const { id, document } = await plan();
    const all = document.pieces.flatMap((p, piece) => (p.sawOrder ?? []).map((s) => ({ piece, step: s.n })));
    expect(all.length).toBeGreaterThan(2);
    const results = await Promise.all(all.flatMap((ref) => [tick(id, fx.cutter, ref), tick(id, fx.owner, ref)]));
    expect(results.every((r) => r.status === 200)).toBe(true);
    const after = await read(id, fx.cutter);
    expect(after.body.ticks.map((t: { piece: number; step: number }) => ({ piece: t.piece, step: t.step }))).toEqual(all);
  });

  test('untick takes a tick back, twice is harmless, and the plan stays cutting', async () => {
    const { id } = await plan();
    await tick(id, fx.cutter, { piece: 0, step: 1 });
    await tick(id, fx.cutter, { piece: 0, step: 2 });
    const res = await untick(id, fx.cutter, { piece: 0, step: 1 });
    expect(res.status).toBe(200);
    expect(res.body.ticks.map((t: { step: number }) => t.step)).toEqual([2]);
    const again = await untick(id, fx.cutter, { piece: 0, step: 1 });
    expect(again.status).toBe(200);
    expect(again.body).toMatchObject({ status: 'cutting', ticks: [{ step: 2 }] });
  });

  test("another shop's plan does not exist for them (404), and nothing is written", async () => {
    const { id } = await plan();
    expect((await tick(id, fx.otherOwner, { piece: 0, step: 1 })).status).toBe(404);
    expect((await untick(id, fx.otherOwner, { piece: 0, step: 1 })).status).toBe(404);
    expect((await read(id, fx.otherOwner)).status).toBe(404);
    expect(await handle.db.select().from(sawSteps).where(eq(sawSteps.planId, id))).toHaveLength(0);
  });

  test.each([
    ['a step the piece does not have', { piece: 0, step: 999 }, 'step'],
    ['a stock piece the plan does not have', { piece: 42, step: 1 }, 'piece'],
    ['step 0', { piece: 0, step: 0 }, 'step'],
    ['a step that is not a number', { piece: 0, step: 'first' }, 'step'],
    ['a missing piece', { step: 1 }, 'piece'],
  ])('%s is refused with 422 naming the field', async (_label, body, field) => {
    const { id } = await plan();
    const res = await tick(id, fx.cutter, body);
    expect(res.status).toBe(422);
    expect(res.body.fields[field]?.length).toBeGreaterThan(0);
  });

  test.each([['draft'], ['done']] as const)('a %s plan is not at the saw: 409', async (status) => {
    const { id } = await plan(status);
    const res = await tick(id, fx.cutter, { piece: 0, step: 1 });
    expect(res.status).toBe(409);
    expect(res.body.error).toMatch(status);
  });

  test('a cutter cannot see a draft plan’s ticks (drafts are for people who edit plans)', async () => {
    const { id } = await plan('draft');
    expect((await read(id, fx.cutter)).status).toBe(404);
    expect((await read(id, fx.estimator)).status).toBe(200);
  });

  test('an estimator may read ticks but not tick', async () => {
    const { id } = await plan();
    expect((await tick(id, fx.estimator, { piece: 0, step: 1 })).status).toBe(403);
    expect((await read(id, fx.estimator)).status).toBe(200);
  });
});

describe('the saw-order PDF download', () => {
  test('is application/pdf with one page per stock piece', async () => {
    const { id, document } = await plan();
    const res = await (pdf.GET as Handler)(await request(`/api/plans/${id}/saw-order-pdf`, { user: fx.cutter }), { params: Promise.resolve({ id }) });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    expect(res.headers.get('content-disposition')).toMatch(/^attachment; filename="saw-order-Birchwood-pantry\.pdf"$/);
    const doc = await PDFDocument.load(new Uint8Array(await res.arrayBuffer()));
    expect(doc.getPageCount()).toBe(document.pieces.length);
  });
});

describe('the part-tags PDF download', () => {
  test('is application/pdf on the chosen sheet, and an unknown sheet is refused with 422', async () => {
    const { id } = await plan();
    const get = async (q: string) =>
      (tagsPdf.GET as Handler)(await request(`/api/plans/${id}/tags-pdf${q}`, { user: fx.cutter }), { params: Promise.resolve({ id }) });
    const res = await get('?sheet=a4-30');
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('application/pdf');
    const doc = await PDFDocument.load(new Uint8Array(await res.arrayBuffer()));
    expect(doc.getPage(0).getSize().width).toBeCloseTo((210 / 25.4) * 72, 1); // A4 width, ISO 216
    const bad = await get('?sheet=avery-9999');
    expect(bad.status).toBe(422);
    expect((await bad.json()).fields.sheet.length).toBeGreaterThan(0);
  });
});

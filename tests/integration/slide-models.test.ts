import { eq } from 'drizzle-orm';
import type { NextRequest } from 'next/server';
import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { auditEvents, parts } from '@/db/schema';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request, type TestUser } from '../support/fixtures';
import * as modelsRoute from '@/app/api/slide-models/route';
import * as modelRoute from '@/app/api/slide-models/[id]/route';
import * as schedulesRoute from '@/app/api/jobs/[id]/drawer-schedules/route';

let handle: DbHandle;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ handle, fx } = app));

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;
async function call(handler: Handler, params: Record<string, string>, opts: { method?: string; body?: unknown; user?: TestUser } = {}) {
  const res = await handler(await request('/api/x', { user: fx.owner, ...opts }), { params: Promise.resolve(params) });
  return { status: res.status, json: await res.json() };
}

// An invented maker-style model: box width = opening − 10 mm, sides up to 16 mm, 250–550 mm long (worked by hand below).
const MODEL = {
  kind: 'undermount',
  name: 'Tessel T-16',
  lengths: [550, 250, 300, 350, 400, 450, 500],
  widthRule: 'outside',
  widthDeduction: 10,
  maxSideThickness: 16,
  bottomRecess: 13,
  heightClearance: 20,
  rearClearance: 10,
};

describe('slide models in Shop settings', () => {
  test('the owner adds a model; everyone in the shop reads it, lengths shortest first; the other shop sees none', async () => {
    const created = await call(modelsRoute.POST, {}, { method: 'POST', body: MODEL });
    expect(created.status).toBe(201);
    expect(created.json).toMatchObject({ name: 'Tessel T-16', lengths: [250, 300, 350, 400, 450, 500, 550], maxSideThickness: 16 });
    for (const user of [fx.estimator, fx.cutter]) {
      const list = await call(modelsRoute.GET, {}, { user });
      expect(list.json.map((m: { id: string }) => m.id)).toContain(created.json.id);
    }
    expect((await call(modelsRoute.GET, {}, { user: fx.otherOwner })).json).toEqual([]);
    const audit = await handle.db.select().from(auditEvents).where(eq(auditEvents.entityId, created.json.id));
    expect(audit.map((a) => a.action)).toEqual(['create']);
  });

  test('a second model of the same name, in any case, is refused (409) and nothing is written', async () => {
    await call(modelsRoute.POST, {}, { method: 'POST', body: { ...MODEL, name: 'Halbrook UM-58' } });
    const again = await call(modelsRoute.POST, {}, { method: 'POST', body: { ...MODEL, name: 'halbrook um-58' } });
    expect(again.status).toBe(409);
    const names = (await call(modelsRoute.GET, {})).json.map((m: { name: string }) => m.name.toLowerCase());
    expect(names.filter((n: string) => n === 'halbrook um-58')).toHaveLength(1);
  });

  test('bad values are refused per field (422): no lengths, a negative deduction, an unknown kind', async () => {
    const res = await call(
      modelsRoute.POST,
      {},
      { method: 'POST', body: { ...MODEL, name: 'Bad', lengths: [], widthDeduction: -1, kind: 'wooden' } },
    );
    expect(res.status).toBe(422);
    expect(Object.keys(res.json.fields).sort()).toEqual(['kind', 'lengths', 'widthDeduction']);
  });

  test('a schedule sized on a model keeps its parts after the model is changed and deleted', async () => {
    const { json: model } = await call(modelsRoute.POST, {}, { method: 'POST', body: { ...MODEL, name: 'Kept rule' } });
    const { id, updatedAt, ...rule } = model;
    void updatedAt;
    const schedule = {
      label: 'On the kept rule',
      quantity: 1,
      size: { from: 'opening', width: 564, height: 180, depth: 540 },
      slide: { type: 'undermount', model: { ...rule, id } },
      thickness: { front: 16, side: 16 },
    };
    const saved = await call(schedulesRoute.POST, { id: fx.myJob.id }, { method: 'POST', body: schedule, user: fx.estimator });
    expect(saved.status).toBe(201);
    // 564 − 10 = 554 mm wide; 540 − 10 = 530 mm of room → the 500 mm slide, and the box is as long.
    expect(saved.json.input.slide.model).toMatchObject({ id, widthDeduction: 10 });

    expect((await call(modelRoute.PUT, { id }, { method: 'PUT', body: { ...MODEL, name: 'Kept rule', widthDeduction: 30 } })).status).toBe(200);
    expect((await call(modelRoute.DELETE, { id }, { method: 'DELETE' })).status).toBe(200);
    expect((await call(modelRoute.DELETE, { id }, { method: 'DELETE' })).status).toBe(404);

    const list = (await call(schedulesRoute.GET, { id: fx.myJob.id }, { user: fx.estimator })).json;
    const again = list.find((s: { id: string }) => s.id === saved.json.id);
    expect(again.input.slide.model.widthDeduction).toBe(10);
    const rows = await handle.db.select().from(parts).where(eq(parts.drawerScheduleId, saved.json.id));
    expect(rows.find((r) => r.role === 'back')!.length).toBeCloseTo(554, 9); // the lock rabbet's back runs the full width
  });

  test('sides thicker than the model takes are refused on the side thickness (422)', async () => {
    const { json: model } = await call(modelsRoute.POST, {}, { method: 'POST', body: { ...MODEL, name: 'Thin sides only' } });
    const { id, updatedAt, ...rule } = model;
    void updatedAt;
    const res = await call(
      schedulesRoute.POST,
      { id: fx.myJob.id },
      {
        method: 'POST',
        user: fx.estimator,
        body: {
          label: 'Too thick',
          quantity: 1,
          size: { from: 'opening', width: 564, height: 180, depth: 540 },
          slide: { type: 'undermount', model: { ...rule, id } },
          thickness: { front: 18, side: 18 },
        },
      },
    );
    expect(res.status).toBe(422);
    // A rule's figures are written exactly, even in an inch shop: 16 mm is no whole number of 32nds.
    expect(res.json.fields['thickness.side'][0]).toBe(
      'The Thin sides only takes sides up to 16 mm; these are 18 mm: use thinner sides or another slide',
    );
  });

  test('another shop’s model cannot be changed or deleted (404)', async () => {
    const { json: model } = await call(modelsRoute.POST, {}, { method: 'POST', body: { ...MODEL, name: 'Mine alone' } });
    expect((await call(modelRoute.PUT, { id: model.id }, { method: 'PUT', body: MODEL, user: fx.otherOwner })).status).toBe(404);
    expect((await call(modelRoute.DELETE, { id: model.id }, { method: 'DELETE', user: fx.otherOwner })).status).toBe(404);
  });
});

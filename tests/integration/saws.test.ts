import { eq } from 'drizzle-orm';
import type { NextRequest } from 'next/server';
import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { auditEvents } from '@/db/schema';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request, type TestUser } from '../support/fixtures';
import * as sawsRoute from '@/app/api/saws/route';
import * as sawRoute from '@/app/api/saws/[id]/route';

let handle: DbHandle;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ handle, fx } = app));

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;
async function call(handler: Handler, params: Record<string, string>, opts: { method?: string; body?: unknown; user?: TestUser } = {}) {
  const res = await handler(await request('/api/x', { user: fx.owner, ...opts }), { params: Promise.resolve(params) });
  return { status: res.status, json: await res.json() };
}

// 30″ rip capacity = 762 mm and ⅛″ kerf = 3.175 mm (1 in = 25.4 mm exactly, NIST SP 811 appendix B).
const TABLE_SAW = {
  kind: 'table-saw',
  name: 'Cabinet saw',
  kerf: 3.175,
  ripCapacity: 762,
  crosscutCapacity: 610,
  maxStages: 3,
  firstStage: 'rip',
  minFenceWidth: 25.4,
};

describe('saws in Shop settings', () => {
  test('the owner adds saws; estimators and cutters read them in the order added; the other shop sees none', async () => {
    const a = await call(sawsRoute.POST, {}, { method: 'POST', body: TABLE_SAW });
    expect(a.status).toBe(201);
    expect(a.json).toMatchObject({
      name: 'Cabinet saw',
      ripCapacity: 762,
      maxStages: 3,
      firstStage: 'rip',
      maxPieceLength: null,
      kindName: null,
    });
    const b = await call(
      sawsRoute.POST,
      {},
      {
        method: 'POST',
        body: { kind: 'track-saw', name: 'Track saw, 2.7 m rail', kerf: 2.2, crosscutCapacity: 2700, maxStages: null, minFenceWidth: 0 },
      },
    );
    expect(b.status).toBe(201);
    for (const user of [fx.estimator, fx.cutter]) {
      const list = await call(sawsRoute.GET, {}, { user });
      expect(list.status).toBe(200);
      const ids = list.json.map((s: { id: string }) => s.id);
      expect(ids.indexOf(a.json.id)).toBeGreaterThanOrEqual(0);
      expect(ids.indexOf(a.json.id)).toBeLessThan(ids.indexOf(b.json.id));
    }
    expect((await call(sawsRoute.GET, {}, { user: fx.otherOwner })).json).toEqual([]);
    const audit = await handle.db.select().from(auditEvents).where(eq(auditEvents.entityId, a.json.id));
    expect(audit.map((e) => e.action)).toEqual(['create']);
  });

  test('an estimator cannot add, change or delete a saw (403), and the other shop cannot reach this one’s (404)', async () => {
    const { json: saw } = await call(sawsRoute.POST, {}, { method: 'POST', body: { ...TABLE_SAW, name: 'Guarded saw' } });
    expect((await call(sawsRoute.POST, {}, { method: 'POST', body: { ...TABLE_SAW, name: 'Not mine' }, user: fx.estimator })).status).toBe(403);
    expect((await call(sawRoute.PUT, { id: saw.id }, { method: 'PUT', body: { ...TABLE_SAW, name: 'Renamed' }, user: fx.estimator })).status).toBe(
      403,
    );
    expect((await call(sawRoute.PUT, { id: saw.id }, { method: 'PUT', body: { ...TABLE_SAW, name: 'Renamed' }, user: fx.otherOwner })).status).toBe(
      404,
    );
    expect((await call(sawRoute.DELETE, { id: saw.id }, { method: 'DELETE', user: fx.otherOwner })).status).toBe(404);
    const list = (await call(sawsRoute.GET, {})).json;
    expect(list.find((s: { id: string }) => s.id === saw.id)).toMatchObject({ name: 'Guarded saw' });
  });

  test('the owner changes and deletes a saw', async () => {
    const { json: saw } = await call(sawsRoute.POST, {}, { method: 'POST', body: { ...TABLE_SAW, name: 'To change' } });
    const changed = await call(
      sawRoute.PUT,
      { id: saw.id },
      { method: 'PUT', body: { ...TABLE_SAW, name: 'To change', ripCapacity: 1270, maxStages: null } },
    );
    expect(changed.status).toBe(200);
    expect(changed.json).toMatchObject({ ripCapacity: 1270, maxStages: null });
    expect((await call(sawRoute.DELETE, { id: saw.id }, { method: 'DELETE' })).status).toBe(200);
    expect((await call(sawsRoute.GET, {})).json.map((s: { id: string }) => s.id)).not.toContain(saw.id);
    expect((await call(sawRoute.DELETE, { id: saw.id }, { method: 'DELETE' })).status).toBe(404);
  });

  test('a second saw of the same name, in any case, is refused (409)', async () => {
    await call(sawsRoute.POST, {}, { method: 'POST', body: { ...TABLE_SAW, name: 'Twin' } });
    const again = await call(sawsRoute.POST, {}, { method: 'POST', body: { ...TABLE_SAW, name: 'TWIN' } });
    expect(again.status).toBe(409);
  });

  test('bad values are refused per field (422): 5 stages, a negative kerf, a shop kind with no name, a width above the length', async () => {
    const res = await call(
      sawsRoute.POST,
      {},
      {
        method: 'POST',
        body: { ...TABLE_SAW, name: 'Bad', maxStages: 5, kerf: -1, kind: 'other', maxPieceLength: 1000, maxPieceWidth: 1200 },
      },
    );
    expect(res.status).toBe(422);
    expect(Object.keys(res.json.fields).sort()).toEqual(['kerf', 'maxStages']);
    const other = await call(
      sawsRoute.POST,
      {},
      { method: 'POST', body: { ...TABLE_SAW, name: 'Bad 2', kind: 'other', maxPieceLength: 1000, maxPieceWidth: 1200 } },
    );
    expect(other.status).toBe(422);
    expect(Object.keys(other.json.fields).sort()).toEqual(['kindName', 'maxPieceWidth']);
  });
});

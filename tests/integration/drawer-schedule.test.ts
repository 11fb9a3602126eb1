import { eq } from 'drizzle-orm';
import type { NextRequest } from 'next/server';
import { describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { drawerSchedules, parts } from '@/db/schema';
import { inches } from '@/lib/units/length';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request, type TestUser } from '../support/fixtures';
import * as schedulesRoute from '@/app/api/jobs/[id]/drawer-schedules/route';
import * as scheduleRoute from '@/app/api/jobs/[id]/drawer-schedules/[scheduleId]/route';
import * as partsRoute from '@/app/api/jobs/[id]/parts/route';
import * as partRoute from '@/app/api/jobs/[id]/parts/[partId]/route';
import * as cardsRoute from '@/app/api/setup-cards/route';
import * as cardRoute from '@/app/api/setup-cards/[id]/route';

let handle: DbHandle;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ handle, fx } = app));

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;
async function call(handler: Handler, params: Record<string, string>, opts: { method?: string; body?: unknown; user?: TestUser } = {}) {
  const res = await handler(await request('/api/x', { user: fx.estimator, ...opts }), { params: Promise.resolve(params) });
  return { status: res.status, json: await res.json() };
}

// Lock rabbet, ½″ sides, ½″ front and back, ⅛″ face left: a 20″ deep box has 19¾″ sides (README, lock rabbet check [CP]).
const schedule = (depthIn: number) => ({
  label: 'Pantry drawers',
  quantity: 3,
  size: { from: 'box', width: inches(14), height: inches(5), depth: inches(depthIn) },
  joint: { method: 'lock-rabbet' },
  thickness: { front: inches(0.5), side: inches(0.5) },
  materials: { sides: 'Baltic birch' },
});
const rowsOf = (scheduleId: string) => handle.db.select().from(parts).where(eq(parts.drawerScheduleId, scheduleId));

describe('drawer schedules feed the cut list', () => {
  test('saving a schedule adds its parts, sized by lib/joinery, marked with the schedule', async () => {
    const res = await call(schedulesRoute.POST, { id: fx.myJob.id }, { method: 'POST', body: schedule(20) });
    expect(res.status).toBe(201);
    expect(res.json).toMatchObject({ label: 'Pantry drawers', partRows: 4 });
    const rows = await rowsOf(res.json.id);
    const side = rows.find((r) => r.role === 'side')!;
    expect(side.length).toBeCloseTo(inches(19.75), 9);
    expect(side.quantity).toBe(6);
    expect(side.label).toBe('Pantry drawers · side');
    expect(side.machining?.length).toBeGreaterThan(0);
    expect(rows.map((r) => r.role).sort()).toEqual(['back', 'bottom', 'front', 'side']);
  });

  test('changing the schedule replaces its rows in place — never duplicated — and keeps them in step', async () => {
    const created = await call(schedulesRoute.POST, { id: fx.myJob.id }, { method: 'POST', body: { ...schedule(20), label: 'Desk drawers' } });
    const before = await rowsOf(created.json.id);
    const updated = await call(
      scheduleRoute.PUT,
      { id: fx.myJob.id, scheduleId: created.json.id },
      { method: 'PUT', body: { ...schedule(22), label: 'Desk drawers' } },
    );
    expect(updated.status).toBe(200);
    const after = await rowsOf(created.json.id);
    expect(after).toHaveLength(before.length);
    expect(after.find((r) => r.role === 'side')!.length).toBeCloseTo(inches(21.75), 9);
    expect(Math.min(...after.map((r) => r.sort))).toBe(Math.min(...before.map((r) => r.sort)));
  });

  test("a schedule's rows keep their sizes: lengths are refused (edit the schedule), notes are allowed, deleting the row is refused", async () => {
    const created = await call(schedulesRoute.POST, { id: fx.myJob.id }, { method: 'POST', body: { ...schedule(18), label: 'Hall drawers' } });
    const [row] = await rowsOf(created.json.id);
    const params = { id: fx.myJob.id, partId: row.id };
    const refused = await call(partRoute.PATCH, params, { method: 'PATCH', body: { length: 100 } });
    expect(refused.status).toBe(409);
    expect(refused.json.error).toBe('This row comes from a drawer schedule: change its length in the schedule instead.');
    expect((await call(partRoute.PATCH, params, { method: 'PATCH', body: { notes: 'pull from rack 2' } })).json.notes).toBe('pull from rack 2');
    expect((await call(partRoute.DELETE, params, { method: 'DELETE' })).status).toBe(409);
  });

  test('an impossible box is refused field by field and writes nothing', async () => {
    const before = (await handle.db.select().from(drawerSchedules)).length;
    const res = await call(
      schedulesRoute.POST,
      { id: fx.myJob.id },
      {
        method: 'POST',
        body: { ...schedule(20), size: { from: 'box', width: 20, height: inches(5), depth: inches(20) } },
      },
    );
    expect(res.status).toBe(422);
    expect(Object.keys(res.json.fields)).toContain('thickness.side');
    expect((await handle.db.select().from(drawerSchedules)).length).toBe(before);
  });

  test('deleting a schedule removes its rows from the cut list and leaves the typed rows', async () => {
    await call(
      partsRoute.POST,
      { id: fx.myJob.id },
      { method: 'POST', body: { label: 'Typed shelf', quantity: 1, length: 500, width: 300, thickness: 18, material: 'MDF' } },
    );
    const created = await call(schedulesRoute.POST, { id: fx.myJob.id }, { method: 'POST', body: { ...schedule(16), label: 'Bath drawers' } });
    expect((await call(scheduleRoute.DELETE, { id: fx.myJob.id, scheduleId: created.json.id }, { method: 'DELETE' })).status).toBe(200);
    expect(await rowsOf(created.json.id)).toHaveLength(0);
    const list = (await call(partsRoute.GET, { id: fx.myJob.id })).json as { label: string }[];
    expect(list.some((p) => p.label === 'Typed shelf')).toBe(true);
    expect(list.some((p) => p.label.startsWith('Bath drawers'))).toBe(false);
  });

  test("another shop cannot change or delete this shop's schedule", async () => {
    const created = await call(schedulesRoute.POST, { id: fx.myJob.id }, { method: 'POST', body: { ...schedule(20), label: 'Guarded' } });
    const params = { id: fx.myJob.id, scheduleId: created.json.id };
    expect((await call(scheduleRoute.PUT, params, { method: 'PUT', body: schedule(10), user: fx.otherOwner })).status).toBe(404);
    expect((await call(scheduleRoute.DELETE, params, { method: 'DELETE', user: fx.otherOwner })).status).toBe(404);
    expect(await rowsOf(created.json.id)).toHaveLength(4);
  });
});

describe('setup cards', () => {
  const card = {
    joint: 'lock-rabbet',
    stockThickness: inches(0.5),
    fields: [{ key: 'bit-height', label: 'Bit height', value: inches(3 / 8), unit: 'mm' }],
    note: 'Test in scrap first.',
  };

  test('a card is saved, listed, changed and deleted; a second card for the same joint and thickness is refused', async () => {
    const created = await call(cardsRoute.POST, {}, { method: 'POST', body: card });
    expect(created.status).toBe(201);
    expect(created.json).toMatchObject({ joint: 'lock-rabbet', fields: card.fields });
    expect((await call(cardsRoute.POST, {}, { method: 'POST', body: { ...card, stockThickness: inches(0.5) + 0.05 } })).status).toBe(409);
    const changed = await call(cardRoute.PUT, { id: created.json.id }, { method: 'PUT', body: { ...card, note: 'Bit raised after test cut.' } });
    expect(changed.json.note).toBe('Bit raised after test cut.');
    expect((await call(cardsRoute.GET, {}, { user: fx.cutter })).json).toHaveLength(1);
    expect((await call(cardsRoute.GET, {}, { user: fx.otherOwner })).json).toHaveLength(0);
    expect((await call(cardRoute.DELETE, { id: created.json.id }, { method: 'DELETE' })).status).toBe(200);
  });

  test('a card with a malformed field is refused with the field named', async () => {
    const res = await call(
      cardsRoute.POST,
      {},
      { method: 'POST', body: { ...card, fields: [{ key: 'Bit Height', label: '', value: 'high', unit: 'mm' }] } },
    );
    expect(res.status).toBe(422);
    expect(Object.keys(res.json.fields).sort()).toEqual(['fields.0.key', 'fields.0.label', 'fields.0.value']);
  });
});

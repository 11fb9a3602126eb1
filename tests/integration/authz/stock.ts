import { offcuts, plans, stockItems } from '@/db/schema';
import type { AuthzFixtures, AuthzRow } from './types';

const freshItem = async ({ db, mine }: AuthzFixtures) => {
  const [item] = await db
    .insert(stockItems)
    .values({
      shopId: mine.id,
      kind: 'sheet',
      material: 'Matrix ply',
      nominalThickness: '18 mm',
      thickness: 18,
      length: 2440,
      width: 1220,
      onHand: 2,
    })
    .returning();
  return { id: item.id };
};

const freshOffcut = async ({ db, mine }: AuthzFixtures) => {
  const [o] = await db.insert(offcuts).values({ shopId: mine.id, material: 'Matrix ply', thickness: 18, length: 600, width: 300 }).returning();
  return { id: o.id };
};

/** A plan that uses no stock: enough to judge access to each step of its life. */
const freshPlan =
  (status: 'draft' | 'released') =>
  async ({ db, mine, myJob }: AuthzFixtures) => {
    const [p] = await db
      .insert(plans)
      .values({
        shopId: mine.id,
        jobId: myJob.id,
        status,
        request: { parts: [], stock: [], settings: {} },
        document: { version: 1, pieces: [], unplaced: [], stockToPull: [], stockToBuy: [], cancelled: false },
      })
      .returning();
    return { id: p.id };
  };

const jobWithPlan = async (fx: AuthzFixtures) => {
  await freshPlan('draft')(fx);
  return { id: fx.myJob.id };
};

const owner = (ok: number) => ({ anonymous: 401, owner: ok, estimator: 403, cutter: 403 });

export const rows: AuthzRow[] = [
  { route: '/api/stock', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  {
    route: '/api/stock',
    method: 'POST',
    body: { kind: 'sheet', material: 'Matrix MDF', nominalThickness: '3/4"', thickness: 18, length: 2440, width: 1220, onHand: 3 },
    expect: { ...owner(201), other: 201 },
  },
  { route: '/api/stock/[id]', method: 'PATCH', target: freshItem, body: { location: 'Rack Z' }, expect: { ...owner(200), other: 404 } },
  { route: '/api/stock/[id]/receive', method: 'POST', target: freshItem, body: { quantity: 2 }, expect: { ...owner(200), other: 404 } },
  {
    route: '/api/stock/[id]/adjust',
    method: 'POST',
    target: freshItem,
    body: { count: 1, reason: 'Counted' },
    expect: { ...owner(200), other: 404 },
  },
  {
    route: '/api/stock/import',
    method: 'POST',
    body: { csv: 'kind,material,thickness,length,width,quantity\nsheet,MDF,18 mm,2440 mm,1220 mm,2\n', commit: 'none' },
    expect: { ...owner(200), other: 200 },
  },
  { route: '/api/stock/movements', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  { route: '/api/offcuts', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  {
    route: '/api/offcuts',
    method: 'POST',
    body: { material: 'Matrix ply', thickness: 18, length: 700, width: 200, location: 'Bin 1' },
    expect: { anonymous: 401, owner: 201, estimator: 403, cutter: 201, other: 201 },
  },
  {
    route: '/api/offcuts/[id]/scrap',
    method: 'POST',
    target: freshOffcut,
    body: { reason: 'Split' },
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 200, other: 404 },
  },
  {
    route: '/api/plans/[id]/release',
    method: 'POST',
    target: freshPlan('draft'),
    expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 },
  },
  {
    route: '/api/plans/[id]/done',
    method: 'POST',
    target: freshPlan('released'),
    body: {},
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 200, other: 404 },
  },
  {
    route: '/api/plans/[id]/cancel',
    method: 'POST',
    target: freshPlan('released'),
    expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 },
  },
  { route: '/api/catalogue', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 200 } },
  {
    route: '/api/jobs/[id]/takeoff',
    method: 'GET',
    target: jobWithPlan,
    expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 },
  },
];

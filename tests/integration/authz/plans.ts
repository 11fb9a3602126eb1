import { jobs, plans, stockItems } from '@/db/schema';
import type { AuthzFixtures, AuthzRow } from './types';

/** One buyable sheet with a fixed id, so a static body can name it as `buy:<id>`. */
const SHEET_ID = '00000000-0000-4000-8000-00000000b001';

const freshJob = async ({ db, mine }: AuthzFixtures) => {
  const [job] = await db.insert(jobs).values({ shopId: mine.id, name: 'Plan target job' }).returning();
  await db
    .insert(stockItems)
    .values({
      id: SHEET_ID,
      shopId: mine.id,
      kind: 'sheet',
      material: 'Birch ply',
      nominalThickness: '18 mm',
      thickness: 18,
      length: 2440,
      width: 1220,
      buyable: true,
      costCents: 6400,
    })
    .onConflictDoNothing();
  return { id: job.id };
};

const EMPTY_PLAN = { version: 1, pieces: [], unplaced: [] };

const freshDraft = async (fx: AuthzFixtures) => {
  const { id: jobId } = await freshJob(fx);
  const [plan] = await fx.db
    .insert(plans)
    .values({ shopId: fx.mine.id, jobId, name: 'Draft', status: 'draft', request: { parts: [], stock: [], settings: {} }, document: EMPTY_PLAN })
    .returning();
  return { id: plan.id };
};

export const rows: AuthzRow[] = [
  {
    route: '/api/jobs/[id]/nest-request',
    method: 'GET',
    target: freshJob,
    expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 },
  },
  { route: '/api/jobs/[id]/plans', method: 'GET', target: freshJob, expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 404 } },
  {
    route: '/api/jobs/[id]/plans',
    method: 'POST',
    target: freshJob,
    body: { name: 'Matrix plan', stockIds: [`buy:${SHEET_ID}`], plan: EMPTY_PLAN },
    expect: { anonymous: 401, owner: 201, estimator: 201, cutter: 403, other: 404 },
  },
  // A cutter reads released plans only: a draft does not exist for them.
  { route: '/api/plans/[id]', method: 'GET', target: freshDraft, expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 404, other: 404 } },
  {
    route: '/api/plans/[id]',
    method: 'PUT',
    target: freshDraft,
    body: { plan: EMPTY_PLAN },
    expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 403, other: 404 },
  },
];

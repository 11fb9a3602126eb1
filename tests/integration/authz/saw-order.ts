import { plans } from '@/db/schema';
import { optimize } from '@/lib/nesting';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import type { AuthzFixtures, AuthzRow } from './types';

/** A released plan in the first shop: one sheet, two parts, so step 1 exists. */
export async function releasedPlan(
  { db, mine, myJob }: Pick<AuthzFixtures, 'db' | 'mine' | 'myJob'>,
  status: 'draft' | 'released' | 'cutting' | 'done' = 'released',
) {
  const request = nestRequestSchema.parse({
    parts: [{ id: 'side', label: 'Side', quantity: 2, length: 700, width: 500, thickness: 18, material: 'Birch ply' }],
    stock: [{ id: 'sheet', kind: 'sheet', length: 2440, width: 1220, thickness: 18, material: 'Birch ply', count: null, costEach: 0 }],
    settings: { kerf: 3.2, trim: 6, timeBudgetMs: 0 },
  });
  const document = await optimize(request);
  const [row] = await db
    .insert(plans)
    .values({ shopId: mine.id, jobId: myJob.id, name: 'Test plan', status, request, document })
    .returning({ id: plans.id });
  return { id: row.id, document };
}

const target = async (fx: AuthzFixtures) => ({ id: (await releasedPlan(fx)).id });

export const rows: AuthzRow[] = [
  { route: '/api/plans/[id]/steps', method: 'GET', target, expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 404 } },
  {
    route: '/api/plans/[id]/steps',
    method: 'POST',
    target,
    body: { piece: 0, step: 1 },
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 200, other: 404 },
  },
  {
    route: '/api/plans/[id]/steps',
    method: 'DELETE',
    target,
    body: { piece: 0, step: 1 },
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 200, other: 404 },
  },
  { route: '/api/plans/[id]/saw-order-pdf', method: 'GET', target, expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 404 } },
  { route: '/api/plans/[id]/tags-pdf', method: 'GET', target, expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 404 } },
];

import { requireJob } from '@/db/queries/parts';
import { buildNestRequest } from '@/db/queries/nest-request';
import { idParams, route } from '@/server/api/route';
import { nestForSchema } from '@/shared/schemas/recut';
import { z } from 'zod';

const query = z.object({ for: nestForSchema.default('cut-list') });

// GET /api/jobs/:id/nest-request – the job's parts (or, with ?for=recuts, only its open re-cuts) and the stock on offer, with the shop's settings, for the worker
export const GET = route({ permission: 'nest:run', params: idParams, query }, async ({ scope, params, query }) => {
  await requireJob(scope, params.id);
  return buildNestRequest(scope, params.id, {}, query.for);
});

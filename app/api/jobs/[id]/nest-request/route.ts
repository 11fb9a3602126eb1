import { buildNestRequest } from '@/db/queries/nest-request';
import { getJob } from '@/db/queries/jobs';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { nestForSchema } from '@/shared/schemas/recut';
import { z } from 'zod';

const query = z.object({ for: nestForSchema.default('cut-list') });

// GET /api/jobs/:id/nest-request – the job's parts (or, with ?for=recuts, only its open re-cuts) and the stock on offer, with the shop's settings, for the worker
export const GET = route({ permission: 'nest:run', params: idParams, query }, async ({ scope, params, query }) => {
  if (!(await getJob(scope, params.id))) throw notFound('That job');
  return buildNestRequest(scope, params.id, {}, query.for);
});

import { buildNestRequest } from '@/db/queries/nest-request';
import { getJob } from '@/db/queries/jobs';
import { notFound } from '@/lib/api/errors';
import { idParams, route } from '@/lib/api/route';

// GET /api/jobs/:id/nest-request – the job's parts and the stock on offer, with the shop's settings, for the worker
export const GET = route({ permission: 'nest:run', params: idParams }, async ({ db, user, params }) => {
  if (!(await getJob(db, user.shopId, params.id))) throw notFound('That job');
  return buildNestRequest(db, user.shopId, params.id);
});

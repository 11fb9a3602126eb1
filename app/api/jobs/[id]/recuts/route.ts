import { getJob } from '@/db/queries/jobs';
import { listRecuts } from '@/db/queries/recuts';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';

// GET /api/jobs/:id/recuts – the job's re-cut list: parts damaged at the saw, open ones first, then those cut or cancelled
export const GET = route({ permission: 'recuts:read', params: idParams }, async ({ scope, params }) => {
  if (!(await getJob(scope, params.id))) throw notFound('That job');
  return listRecuts(scope, params.id);
});

import { requireJob } from '@/db/queries/parts';
import { listRecuts } from '@/db/queries/recuts';
import { idParams, route } from '@/server/api/route';

// GET /api/jobs/:id/recuts – the job's re-cut list: parts damaged at the saw, open ones first, then those cut or cancelled
export const GET = route({ permission: 'recuts:read', params: idParams }, async ({ scope, params }) => {
  await requireJob(scope, params.id);
  return listRecuts(scope, params.id);
});

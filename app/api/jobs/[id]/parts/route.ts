import { addParts, listJobParts, requireJob } from '@/db/queries/parts';
import { idParams, route } from '@/server/api/route';
import { partInputSchema } from '@/shared/schemas/part';

// GET /api/jobs/:id/parts – the job's cut list, in order
export const GET = route({ permission: 'jobs:read', params: idParams }, async ({ scope, params }) => {
  await requireJob(scope, params.id);
  return listJobParts(scope, params.id);
});

// POST /api/jobs/:id/parts – add one row at the end of the cut list, or back at its place (undoing a delete)
export const POST = route({ permission: 'cutlist:write', params: idParams, body: partInputSchema, status: 201 }, async ({ scope, params, body }) => {
  const added = await addParts(scope, params.id, [body], 'typed');
  return added[0];
});

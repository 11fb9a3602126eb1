import { addParts, jobInShop, listJobParts } from '@/db/queries/parts';
import { notFound } from '@/lib/api/errors';
import { idParams, route } from '@/lib/api/route';
import { partInputSchema } from '@/shared/schemas/part';

// GET /api/jobs/:id/parts – the job's cut list, in order
export const GET = route({ permission: 'jobs:read', params: idParams }, async ({ db, user, params }) => {
  if (!(await jobInShop(db, user.shopId, params.id))) throw notFound('That job');
  return listJobParts(db, user.shopId, params.id);
});

// POST /api/jobs/:id/parts – add one row at the end of the cut list, or back at its place (undoing a delete)
export const POST = route(
  { permission: 'cutlist:write', params: idParams, body: partInputSchema, status: 201 },
  async ({ db, user, params, body }) => {
    const added = await addParts(db, user.shopId, user.id, params.id, [body], 'typed');
    if (!added) throw notFound('That job');
    return added[0];
  },
);

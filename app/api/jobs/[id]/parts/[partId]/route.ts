import { deletePart, updatePart } from '@/db/queries/parts';
import { route } from '@/server/api/route';
import { partParams, partPatchSchema } from '@/shared/schemas/part';

// PATCH /api/jobs/:id/parts/:partId – change cells of one row (a drawer schedule's row: notes only)
export const PATCH = route({ permission: 'cutlist:write', params: partParams, body: partPatchSchema }, async ({ scope, params, body }) => {
  return updatePart(scope, params.id, params.partId, body);
});

// DELETE /api/jobs/:id/parts/:partId – delete a typed or uploaded row
export const DELETE = route({ permission: 'cutlist:write', params: partParams }, async ({ scope, params }) => {
  await deletePart(scope, params.id, params.partId);
  return { ok: true };
});

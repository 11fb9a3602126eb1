import { deletePart, updatePart } from '@/db/queries/parts';
import { notFound } from '@/server/api/errors';
import { route } from '@/server/api/route';
import { partParams, partPatchSchema } from '@/shared/schemas/part';

// PATCH /api/jobs/:id/parts/:partId – change cells of one row (a drawer schedule's row: notes only)
export const PATCH = route({ permission: 'cutlist:write', params: partParams, body: partPatchSchema }, async ({ scope, params, body }) => {
  return (await updatePart(scope, params.id, params.partId, body)) ?? Promise.reject(notFound('That part'));
});

// DELETE /api/jobs/:id/parts/:partId – delete a typed or uploaded row
export const DELETE = route({ permission: 'cutlist:write', params: partParams }, async ({ scope, params }) => {
  if (!(await deletePart(scope, params.id, params.partId))) throw notFound('That part');
  return { ok: true };
});

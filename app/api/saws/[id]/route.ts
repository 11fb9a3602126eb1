import { deleteSaw, updateSaw } from '@/db/queries/saws';
import { idParams, route } from '@/server/api/route';
import { sawSchema } from '@/shared/schemas/saw';

// PUT /api/saws/:id – change a saw (owner); saved plans keep the profile they were nested with
export const PUT = route({ permission: 'settings:write', params: idParams, body: sawSchema }, async ({ scope, params, body }) => {
  return updateSaw(scope, params.id, body);
});

// DELETE /api/saws/:id – delete a saw (owner); saved plans keep its profile
export const DELETE = route({ permission: 'settings:write', params: idParams }, async ({ scope, params }) => {
  await deleteSaw(scope, params.id);
  return { ok: true };
});

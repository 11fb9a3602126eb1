import { deleteSaw, updateSaw } from '@/db/queries/saws';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { sawSchema } from '@/shared/schemas/saw';

// PUT /api/saws/:id – change a saw (owner); saved plans keep the profile they were nested with
export const PUT = route({ permission: 'settings:write', params: idParams, body: sawSchema }, async ({ scope, params, body }) => {
  return (await updateSaw(scope, params.id, body)) ?? Promise.reject(notFound('That saw'));
});

// DELETE /api/saws/:id – delete a saw (owner); saved plans keep its profile
export const DELETE = route({ permission: 'settings:write', params: idParams }, async ({ scope, params }) => {
  if (!(await deleteSaw(scope, params.id))) throw notFound('That saw');
  return { ok: true };
});

import { deleteSlideModel, updateSlideModel } from '@/db/queries/slide-models';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { slideModelSchema } from '@/shared/schemas/slide-model';

// PUT /api/slide-models/:id – change a slide model (owner); saved drawer schedules keep the rule they were sized by
export const PUT = route({ permission: 'settings:write', params: idParams, body: slideModelSchema }, async ({ scope, params, body }) => {
  return (await updateSlideModel(scope, params.id, body)) ?? Promise.reject(notFound('That slide model'));
});

// DELETE /api/slide-models/:id – delete a slide model (owner); schedules sized on it keep its rule
export const DELETE = route({ permission: 'settings:write', params: idParams }, async ({ scope, params }) => {
  if (!(await deleteSlideModel(scope, params.id))) throw notFound('That slide model');
  return { ok: true };
});

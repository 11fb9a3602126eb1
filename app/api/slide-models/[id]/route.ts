import { deleteSlideModel, updateSlideModel } from '@/db/queries/slide-models';
import { idParams, route } from '@/server/api/route';
import { slideModelSchema } from '@/shared/schemas/slide-model';

// PUT /api/slide-models/:id – change a slide model (owner); saved drawer schedules keep the rule they were sized by
export const PUT = route({ permission: 'settings:write', params: idParams, body: slideModelSchema }, async ({ scope, params, body }) => {
  return updateSlideModel(scope, params.id, body);
});

// DELETE /api/slide-models/:id – delete a slide model (owner); schedules sized on it keep its rule
export const DELETE = route({ permission: 'settings:write', params: idParams }, async ({ scope, params }) => {
  await deleteSlideModel(scope, params.id);
  return { ok: true };
});

import { deleteHardware, updateHardware } from '@/db/queries/pricing';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { hardwareItemSchema } from '@/shared/schemas/pricing';

// PUT /api/settings/hardware/:id – change an item of the price list (owner)
export const PUT = route({ permission: 'settings:write', params: idParams, body: hardwareItemSchema }, async ({ scope, params, body }) => {
  return (await updateHardware(scope, params.id, body)) ?? Promise.reject(notFound('That item'));
});

// DELETE /api/settings/hardware/:id – take an item off the price list (owner); quotes keep their copied lines
export const DELETE = route({ permission: 'settings:write', params: idParams }, async ({ scope, params }) => {
  if (!(await deleteHardware(scope, params.id))) throw notFound('That item');
  return { ok: true };
});

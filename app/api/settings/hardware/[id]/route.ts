import { deleteHardware, updateHardware } from '@/db/queries/pricing';
import { idParams, route } from '@/server/api/route';
import { hardwareItemSchema } from '@/shared/schemas/pricing';

// PUT /api/settings/hardware/:id – change an item of the price list (owner)
export const PUT = route({ permission: 'settings:write', params: idParams, body: hardwareItemSchema }, async ({ scope, params, body }) => {
  return updateHardware(scope, params.id, body);
});

// DELETE /api/settings/hardware/:id – take an item off the price list (owner); quotes keep their copied lines
export const DELETE = route({ permission: 'settings:write', params: idParams }, async ({ scope, params }) => {
  await deleteHardware(scope, params.id);
  return { ok: true };
});

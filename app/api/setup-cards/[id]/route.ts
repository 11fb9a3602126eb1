import { deleteSetupCard, updateSetupCard } from '@/db/queries/setup-cards';
import { idParams, route } from '@/server/api/route';
import { setupCardSchema } from '@/shared/schemas/setup-card';

// PUT /api/setup-cards/:id – change a setup card's joint, thickness, settings or note
export const PUT = route({ permission: 'cutlist:write', params: idParams, body: setupCardSchema }, async ({ scope, params, body }) => {
  return updateSetupCard(scope, params.id, body);
});

// DELETE /api/setup-cards/:id – delete a setup card (schedules fall back to the starting values)
export const DELETE = route({ permission: 'cutlist:write', params: idParams }, async ({ scope, params }) => {
  await deleteSetupCard(scope, params.id);
  return { ok: true };
});

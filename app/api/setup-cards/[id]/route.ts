import { deleteSetupCard, updateSetupCard } from '@/db/queries/setup-cards';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { setupCardSchema } from '@/shared/schemas/setup-card';

// PUT /api/setup-cards/:id – change a setup card's joint, thickness, settings or note
export const PUT = route({ permission: 'cutlist:write', params: idParams, body: setupCardSchema }, async ({ scope, params, body }) => {
  return (await updateSetupCard(scope, params.id, body)) ?? Promise.reject(notFound('That setup card'));
});

// DELETE /api/setup-cards/:id – delete a setup card (schedules fall back to the starting values)
export const DELETE = route({ permission: 'cutlist:write', params: idParams }, async ({ scope, params }) => {
  if (!(await deleteSetupCard(scope, params.id))) throw notFound('That setup card');
  return { ok: true };
});

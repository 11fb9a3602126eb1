import { idParams, route } from '@/server/api/route';
import { scrapOffcut } from '@/db/queries/stock';
import { scrapOffcutSchema } from '@/shared/schemas/stock';

// POST /api/offcuts/:id/scrap – take an available offcut off the rack for good
export const POST = route({ permission: 'offcuts:record', params: idParams, body: scrapOffcutSchema }, async ({ scope, params, body }) => {
  return scrapOffcut(scope, params.id, body.reason);
});

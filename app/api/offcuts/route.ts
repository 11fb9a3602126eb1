import { route } from '@/server/api/route';
import { can } from '@/lib/auth/permissions';
import { listOffcuts, recordOffcut } from '@/db/queries/stock';
import { withoutPrices } from '@/lib/stock/without-prices';
import { recordOffcutSchema, stockFilterSchema } from '@/shared/schemas/stock';

// GET /api/offcuts – the offcut rack, filtered by material, location and status
export const GET = route({ permission: 'stock:read', query: stockFilterSchema }, async ({ scope, user, query }) => {
  const rack = await listOffcuts(scope, query);
  return { offcuts: can(user.role, 'prices:read') ? rack : rack.map(withoutPrices) };
});

// POST /api/offcuts – record an offcut put on the rack at the saw
export const POST = route({ permission: 'offcuts:record', body: recordOffcutSchema, status: 201 }, async ({ scope, body }) =>
  recordOffcut(scope, body),
);

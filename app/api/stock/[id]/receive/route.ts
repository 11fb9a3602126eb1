import { idParams, route } from '@/server/api/route';
import { notFound } from '@/server/api/errors';
import { receiveStock } from '@/db/queries/stock';
import { receiveStockSchema } from '@/shared/schemas/stock';

// POST /api/stock/:id/receive – add delivered pieces to the count, with a receipt in the ledger
export const POST = route({ permission: 'stock:write', params: idParams, body: receiveStockSchema }, async ({ scope, params, body }) => {
  const item = await receiveStock(scope, params.id, body);
  if (!item) throw notFound('That stock item');
  return item;
});

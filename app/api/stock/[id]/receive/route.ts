import { idParams, route } from '@/server/api/route';
import { receiveStock } from '@/db/queries/stock';
import { receiveStockSchema } from '@/shared/schemas/stock';

// POST /api/stock/:id/receive – add delivered pieces to the count, with a receipt in the ledger
export const POST = route({ permission: 'stock:write', params: idParams, body: receiveStockSchema }, async ({ scope, params, body }) => {
  return receiveStock(scope, params.id, body);
});

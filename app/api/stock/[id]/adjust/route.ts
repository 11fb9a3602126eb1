import { idParams, route } from '@/server/api/route';
import { adjustStock } from '@/db/queries/stock';
import { adjustStockSchema } from '@/shared/schemas/stock';

// POST /api/stock/:id/adjust – replace the book count with a counted one, with the reason in the ledger
export const POST = route({ permission: 'stock:write', params: idParams, body: adjustStockSchema }, async ({ scope, params, body }) => {
  return adjustStock(scope, params.id, body);
});

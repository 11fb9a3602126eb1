import { idParams, route } from '@/server/api/route';
import { updateStockItem } from '@/db/queries/stock';
import { stockItemPatchSchema } from '@/shared/schemas/stock';

// PATCH /api/stock/:id – change a size's details (name, supplier, location, cost, low-stock mark, grade, buyable); counts change by receipt or adjustment, and a different size is a new stock size
export const PATCH = route({ permission: 'stock:write', params: idParams, body: stockItemPatchSchema }, async ({ scope, params, body }) => {
  return updateStockItem(scope, params.id, body);
});

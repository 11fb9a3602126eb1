import { idParams, route } from '@/server/api/route';
import { notFound } from '@/server/api/errors';
import { updateStockItem } from '@/db/queries/stock';
import { stockItemPatchSchema } from '@/shared/schemas/stock';

// PATCH /api/stock/:id – change a size's details (name, supplier, location, cost, low-stock mark, grade, buyable); counts change by receipt or adjustment, and a different size is a new stock size
export const PATCH = route({ permission: 'stock:write', params: idParams, body: stockItemPatchSchema }, async ({ scope, params, body }) => {
  const item = await updateStockItem(scope, params.id, body);
  if (!item) throw notFound('That stock item');
  return item;
});

import { route } from '@/server/api/route';
import { can } from '@/lib/auth/permissions';
import { createStockItem, listStock, stockValue } from '@/db/queries/stock';
import { withoutPrices } from '@/lib/stock/without-prices';
import { stockFilterSchema, stockItemSchema } from '@/shared/schemas/stock';

// GET /api/stock – sheets and boards, filtered by kind, material, thickness and location; prices only for those who may see them
export const GET = route({ permission: 'stock:read', query: stockFilterSchema }, async ({ scope, user, query }) => {
  const items = await listStock(scope, query);
  if (!can(user.role, 'prices:read')) return { items: items.map(withoutPrices) };
  return { items, value: await stockValue(scope) };
});

// POST /api/stock – a new sheet or board size (or a size to buy); its opening count is a receipt
export const POST = route({ permission: 'stock:write', body: stockItemSchema, status: 201 }, async ({ scope, body }) => createStockItem(scope, body));

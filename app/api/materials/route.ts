import { listOffcuts, listStock } from '@/db/queries/stock';
import { toStockOffers } from '@/lib/cut-list/stock-match';
import { route } from '@/lib/api/route';

// GET /api/materials – the materials and thicknesses the stock room offers (sheets, boards, available offcuts), for pickers; no prices
export const GET = route({ permission: 'stock:read' }, async ({ db, user }) => {
  const [items, offcuts] = await Promise.all([listStock(db, user.shopId), listOffcuts(db, user.shopId)]);
  return toStockOffers(items, offcuts);
});

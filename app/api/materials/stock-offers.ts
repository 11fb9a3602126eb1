import type { Db } from '@/db/open';
import { listOffcuts, listStock } from '@/db/queries/stock';
import { toStockOffers, type StockOffer } from '@/lib/cut-list/stock-match';

/** What the shop's stock room offers, for pickers, stock warnings and thickness snapping. */
export async function stockOffers(db: Db, shopId: string): Promise<StockOffer[]> {
  const [items, offcuts] = await Promise.all([listStock({ db, shopId }), listOffcuts({ db, shopId })]);
  return toStockOffers(items, offcuts);
}

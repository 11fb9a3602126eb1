import { jobInShop } from '@/db/queries/parts';
import { getShopSettings } from '@/db/queries/shops';
import { listOffcuts, listStock } from '@/db/queries/stock';
import { stockMatchWarning, toStockOffers } from '@/lib/cut-list/stock-match';
import { validateUploadRows } from '@/lib/cut-list/validate-rows';
import { notFound } from '@/lib/api/errors';
import { idParams, route } from '@/lib/api/route';
import { cutListUploadSchema } from '@/shared/schemas/cut-list-upload';

// POST /api/jobs/:id/cut-list/preview – check every row of an upload and what the stock room has for it; writes nothing
export const POST = route({ permission: 'cutlist:write', params: idParams, body: cutListUploadSchema }, async ({ db, user, params, body }) => {
  if (!(await jobInShop(db, user.shopId, params.id))) throw notFound('That job');
  const [settings, items, offcuts] = await Promise.all([getShopSettings(db, user.shopId), listStock(db, user.shopId), listOffcuts(db, user.shopId)]);
  if (!settings) throw notFound('The shop');
  const offers = toStockOffers(items, offcuts);
  const report = validateUploadRows(body);
  const warnings = report.valid.flatMap(({ line, part }) => {
    const message = stockMatchWarning(part, offers, settings.units);
    return message ? [{ line, message }] : [];
  });
  return { rows: report.rows, validCount: report.valid.length, invalidCount: report.invalidCount, warnings };
});

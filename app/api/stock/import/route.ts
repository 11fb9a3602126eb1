import { route } from '@/lib/api/route';
import { HttpError } from '@/lib/api/errors';
import { getShopSettings } from '@/db/queries/shops';
import { importStock } from '@/db/queries/stock';
import { checkStockCsv } from '@/lib/stock/stock-csv';
import { importStockSchema } from '@/shared/schemas/stock';
import { shopLengthUnit } from '@/shared/schemas/units';

// POST /api/stock/import – check a stock CSV row by row; write all rows (only if every one is valid) or only the valid ones
export const POST = route({ permission: 'stock:write', body: importStockSchema }, async ({ db, user, body }) => {
  const settings = await getShopSettings(db, user.shopId);
  const result = await checkStockCsv(body.csv, settings ? shopLengthUnit(settings.units) : 'mm');
  if (result.fileErrors.length) throw new HttpError(422, result.fileErrors.join(' '), { csv: result.fileErrors });
  const summary = { valid: result.rows.length, errors: result.errors, rows: result.rows };
  if (body.commit === 'none') return { ...summary, imported: 0 };
  if (body.commit === 'all' && result.errors.length) {
    throw new HttpError(
      422,
      `${result.errors.length} row${result.errors.length === 1 ? ' has' : 's have'} problems; nothing was imported. Fix them, or import only the valid rows.`,
      {
        csv: result.errors.map((e) => `Line ${e.line}: ${e.messages.join('; ')}`),
      },
    );
  }
  const written = await importStock(
    db,
    user.shopId,
    user.id,
    result.rows.map((r) => r.item),
  );
  return { ...summary, imported: written.length };
});

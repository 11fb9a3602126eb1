import { route } from '@/server/api/route';
import { invalid } from '@/server/api/errors';
import { getShopSettings } from '@/db/queries/shops';
import { importStock } from '@/db/queries/stock';
import { checkStockCsv } from '@/lib/stock/stock-csv';
import { importStockSchema } from '@/shared/schemas/stock';
import { shopLengthUnit } from '@/shared/schemas/units';

// POST /api/stock/import – check a stock CSV row by row; write all rows (only if every one is valid) or only the valid ones
export const POST = route({ permission: 'stock:write', body: importStockSchema }, async ({ scope, body }) => {
  const settings = await getShopSettings(scope);
  const result = await checkStockCsv(body.csv, settings ? shopLengthUnit(settings.units) : 'mm');
  if (result.fileErrors.length) throw invalid(result.fileErrors.join(' '), { csv: result.fileErrors });
  const summary = { valid: result.rows.length, errors: result.errors, rows: result.rows };
  if (body.commit === 'none') return { ...summary, imported: 0 };
  if (body.commit === 'all' && result.errors.length) {
    throw invalid(
      `${result.errors.length} row${result.errors.length === 1 ? ' has' : 's have'} problems; nothing was imported. Fix them, or import only the valid rows.`,
      {
        csv: result.errors.map((e) => `Line ${e.line}: ${e.messages.join('; ')}`),
      },
    );
  }
  const written = await importStock(
    scope,
    result.rows.map((r) => r.item),
  );
  return { ...summary, imported: written.length };
});

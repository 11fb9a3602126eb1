import { requireJob } from '@/db/queries/parts';
import { getShopSettings } from '@/db/queries/shops';
import { snapReport, stockMatchWarning } from '@/lib/cut-list/stock-match';
import { validateUploadRows } from '@/lib/cut-list/validate-rows';
import { idParams, route } from '@/server/api/route';
import { cutListUploadSchema } from '@/shared/schemas/cut-list-upload';
import { stockOffers } from '@/app/api/materials/stock-offers';

// POST /api/jobs/:id/cut-list/preview – check every row of an upload and what the stock room has for it; writes nothing
export const POST = route({ permission: 'cutlist:write', params: idParams, body: cutListUploadSchema }, async ({ scope, db, user, params, body }) => {
  await requireJob(scope, params.id);
  const [settings, offers] = await Promise.all([getShopSettings(scope), stockOffers(db, user.shopId)]);
  const report = snapReport(validateUploadRows(body), offers);
  const warnings = report.valid.flatMap(({ line, part }) => {
    const message = stockMatchWarning(part, offers, settings.units);
    return message ? [{ line, message }] : [];
  });
  return { rows: report.rows, validCount: report.valid.length, invalidCount: report.invalidCount, warnings };
});

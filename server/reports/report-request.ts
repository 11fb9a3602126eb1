import 'server-only';
import type { Db } from '@/db/open';
import { getShopSettings } from '@/db/queries/shops';
import { invalid } from '@/server/api/errors';
import { reportRange, type ReportQuery } from '@/shared/schemas/report';

/** A report's filter for the signed-in person's shop: its time zone and units, the range with defaults filled in. */
export async function reportFilterFor(db: Db, shopId: string, query: ReportQuery, now = new Date()) {
  const settings = await getShopSettings({ db, shopId });
  const range = reportRange(query, settings.timeZone, now);
  if ('error' in range) throw invalid(range.error, { from: [range.error] });
  return {
    settings,
    filter: { shopId, timeZone: settings.timeZone, material: query.material, customerId: query.customer, jobId: query.job, ...range },
  };
}

/** A CSV download: a byte-order mark so spreadsheets read ″ and ² as UTF-8. */
export const csvResponse = (csv: string, name: string) =>
  new Response(`\uFEFF${csv}\r\n`, {
    headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="${name}"`, 'cache-control': 'no-store' },
  });

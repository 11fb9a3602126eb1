import { yieldOverTime } from '@/db/queries/reports';
import { route } from '@/server/api/route';
import { csvResponse, reportFilterFor } from '@/server/reports/report-request';
import { yieldCsv } from '@/lib/reports/yield-report';
import { reportQuerySchema } from '@/shared/schemas/report';

// GET /api/reports/yield – yield over time as CSV, per period, material and thickness (the report's filters)
export const GET = route({ permission: 'yield:read', query: reportQuerySchema }, async ({ db, user, query }) => {
  const { settings, filter } = await reportFilterFor(db, user.shopId, query);
  return csvResponse(yieldCsv(await yieldOverTime(db, filter), settings.units), `yield-${filter.from}-to-${filter.to}.csv`);
});

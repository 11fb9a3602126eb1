import { offcutUse } from '@/db/queries/reports';
import { route } from '@/server/api/route';
import { offcutUseCsv } from '@/lib/reports/offcut-report';
import { csvResponse, reportFilterFor } from '@/server/reports/report-request';
import { reportQuerySchema } from '@/shared/schemas/report';

// GET /api/reports/offcut-use – offcut use over time as CSV, one line per period (the report's filters)
export const GET = route({ permission: 'yield:read', query: reportQuerySchema }, async ({ db, user, query }) => {
  const { settings, filter } = await reportFilterFor(db, user.shopId, query);
  return csvResponse(offcutUseCsv(await offcutUse(db, filter), settings.units), `offcut-use-${filter.from}-to-${filter.to}.csv`);
});

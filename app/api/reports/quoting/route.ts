import { quotingReport } from '@/db/queries/quoting-report';
import { route } from '@/server/api/route';
import { quotingCsv } from '@/lib/reports/quoting-report';
import { csvResponse, reportFilterFor } from '@/server/reports/report-request';
import { reportQuerySchema } from '@/shared/schemas/report';

// GET /api/reports/quoting – quotes sent, accepted, declined and expired, value won and deposits per period, as CSV
export const GET = route({ permission: 'quotes:read', query: reportQuerySchema }, async ({ db, user, query }) => {
  const { settings, filter } = await reportFilterFor(db, user.shopId, query);
  return csvResponse(quotingCsv((await quotingReport(db, filter)).periods, settings.currency), `quoting-${filter.from}-to-${filter.to}.csv`);
});

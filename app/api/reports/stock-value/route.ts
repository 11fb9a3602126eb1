import Papa from 'papaparse';
import { stockValueReport } from '@/db/queries/reports';
import { route } from '@/server/api/route';
import { FORMULA_START } from '@/lib/cut-list/export-csv';
import { csvResponse, reportFilterFor } from '@/server/reports/report-request';
import { stockValueCsv } from '@/lib/reports/stock-value';
import { reportQuerySchema } from '@/shared/schemas/report';

// GET /api/reports/stock-value – stock value on hand and reserved at each period's close, as CSV (the report's filters)
export const GET = route({ permission: 'yield:read', query: reportQuerySchema }, async ({ db, user, query }) => {
  const { settings, filter } = await reportFilterFor(db, user.shopId, query);
  const { points } = await stockValueReport(db, filter);
  const csv = stockValueCsv(points, settings.currency, (rows) => Papa.unparse(rows, { escapeFormulae: FORMULA_START, newline: '\r\n' }));
  return csvResponse(csv, `stock-value-${filter.from}-to-${filter.to}.csv`);
});

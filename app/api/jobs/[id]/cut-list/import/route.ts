import { addParts } from '@/db/queries/parts';
import { validateUploadRows } from '@/lib/cut-list/validate-rows';
import { snapReport } from '@/lib/cut-list/stock-match';
import { invalid } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { CUT_LIST_FIELD_LABELS, cutListImportSchema } from '@/shared/schemas/cut-list-upload';
import { stockOffers } from '@/app/api/materials/stock-offers';

// POST /api/jobs/:id/cut-list/import – add an upload's rows in one transaction: all of them, or only the valid ones when asked
export const POST = route(
  { permission: 'cutlist:write', params: idParams, body: cutListImportSchema, status: 201 },
  async ({ scope, db, user, params, body }) => {
    const report = snapReport(validateUploadRows(body), await stockOffers(db, user.shopId));
    if (report.invalidCount > 0 && body.mode === 'all') {
      const fields: Record<string, string[]> = {};
      for (const row of report.rows) {
        if (!row.ok)
          fields[`rows.${row.line}`] = row.problems.map((p) => (p.field === 'row' ? p.message : `${CUT_LIST_FIELD_LABELS[p.field]}: ${p.message}`));
      }
      throw invalid(
        `${report.invalidCount} of ${report.rows.length} rows have problems, so nothing was imported. Fix them, or import only the valid rows.`,
        fields,
      );
    }
    const added = await addParts(
      scope,
      params.id,
      report.valid.map((v) => v.part),
      'upload',
    );
    return { imported: added.length, skipped: report.invalidCount, skippedLines: report.rows.filter((r) => !r.ok).map((r) => r.line) };
  },
);

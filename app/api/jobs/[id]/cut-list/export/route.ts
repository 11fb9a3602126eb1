import { getJob } from '@/db/queries/jobs';
import { listJobParts } from '@/db/queries/parts';
import { getShopSettings } from '@/db/queries/shops';
import { cutListCsv } from '@/lib/cut-list/export-csv';
import { idParams, route } from '@/server/api/route';

/** A file name from the job's name: letters, digits and dashes only. */
const fileName = (job: string) =>
  `${
    job
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'job'
  }-cut-list.csv`;

// GET /api/jobs/:id/cut-list/export – the cut list as a CSV file in the shop's unit
export const GET = route({ permission: 'jobs:read', params: idParams }, async ({ scope, params }) => {
  const [job, settings] = await Promise.all([getJob(scope, params.id), getShopSettings(scope)]);
  const csv = cutListCsv(await listJobParts(scope, job.id), settings.units);
  // A byte-order mark so spreadsheets open the inch and fraction marks as UTF-8.
  return new Response(`\uFEFF${csv}\r\n`, {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="${fileName(job.name)}"`,
      'cache-control': 'no-store',
    },
  });
});

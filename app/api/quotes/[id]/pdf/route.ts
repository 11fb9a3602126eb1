import { customerOfJob } from '@/db/queries/customers';
import { getJob } from '@/db/queries/jobs';
import { getRevision, quotePdfInput } from '@/db/queries/quotes';
import { getShopSettings } from '@/db/queries/shops';
import { idParams, route } from '@/server/api/route';
import { quotePdf } from '@/lib/quotes/quote-pdf';
import { pdfFileName } from '@/lib/saw-order/pdf-text';

// GET /api/quotes/:id/pdf – the customer's copy of a quote revision as a PDF (prices only: no cost, margin or hours)
export const GET = route({ permission: 'quotes:read', params: idParams }, async ({ scope, params }) => {
  const revision = await getRevision(scope, params.id);
  const [job, shop] = await Promise.all([getJob(scope, revision.jobId), getShopSettings(scope)]);
  const customer = await customerOfJob(scope, job);
  const bytes = await quotePdf(quotePdfInput(revision, job, customer, shop));
  return new Response(new Uint8Array(bytes), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="${pdfFileName(`${revision.title} ${job.name}`)}.pdf"`,
      'cache-control': 'private, no-store',
    },
  });
});

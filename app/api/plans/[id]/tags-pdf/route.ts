import { z } from 'zod';
import { getSawOrder } from '@/db/queries/saw-steps';
import { idParams, route } from '@/server/api/route';
import { can } from '@/lib/auth/permissions';
import { LABEL_SHEETS, labelSheet } from '@/lib/saw-order/label-sheets';
import { partTagPath, partTags } from '@/lib/saw-order/part-tags';
import { pdfFileName } from '@/lib/saw-order/pdf-text';
import { siteOrigin } from '@/lib/saw-order/site-origin';
import { tagsPdf } from '@/lib/saw-order/tags-pdf';

const sheetIds = LABEL_SHEETS.map((s) => s.id) as [string, ...string[]];
const tagsQuery = z.object({ sheet: z.enum(sheetIds, { error: `The label sheet is one of: ${sheetIds.join(', ')}.` }).optional() });

// GET /api/plans/:id/tags-pdf?sheet= – part tags as a PDF on a label sheet, one tag per placed part
export const GET = route({ permission: 'plans:read', params: idParams, query: tagsQuery }, async ({ scope, req, user, params, query }) => {
  const order = await getSawOrder(scope, params.id, { drafts: can(user.role, 'plans:write') });
  const origin = siteOrigin(req.headers, process.env.NEXTAUTH_URL);
  const bytes = await tagsPdf({
    jobName: order.job.name,
    tags: partTags(order.document, order.parts),
    url: (tag) => origin + partTagPath(order.id, tag),
    units: order.units,
    sheet: labelSheet(query.sheet),
  });
  return new Response(Buffer.from(bytes), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="part-tags-${pdfFileName(order.job.name)}.pdf"`,
      'cache-control': 'private, no-store',
    },
  });
});

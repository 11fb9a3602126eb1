import { getSawOrder } from '@/db/queries/saw-steps';
import { idParams, route } from '@/server/api/route';
import { can } from '@/lib/auth/permissions';
import { pdfFileName } from '@/lib/saw-order/pdf-text';
import { sawOrderPdf } from '@/lib/saw-order/saw-order-pdf';
import { z } from 'zod';

const pdfQuery = z.object({ page: z.enum(['letter', 'a4']).optional() });

// GET /api/plans/:id/saw-order-pdf?page=letter|a4 – the saw order as a PDF, one page per stock piece
export const GET = route({ permission: 'plans:read', params: idParams, query: pdfQuery }, async ({ scope, user, params, query }) => {
  const order = await getSawOrder(scope, params.id, { drafts: can(user.role, 'plans:write') });
  const bytes = await sawOrderPdf({
    title: order.job.name,
    subtitle: `${order.name} · ${order.document.pieces.length} stock piece${order.document.pieces.length === 1 ? '' : 's'}`,
    units: order.units,
    kerf: order.kerf,
    pieces: order.document.pieces,
    pageSize: query.page ?? (order.units.system === 'metric' ? 'a4' : 'letter'),
  });
  return new Response(Buffer.from(bytes), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': `attachment; filename="saw-order-${pdfFileName(order.job.name)}.pdf"`,
      'cache-control': 'private, no-store',
    },
  });
});

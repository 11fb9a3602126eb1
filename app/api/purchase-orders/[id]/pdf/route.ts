import { getPurchaseOrder } from '@/db/queries/purchase-orders';
import { idParams, route } from '@/server/api/route';
import { renderPurchaseOrder } from '@/server/buying/send';

// GET /api/purchase-orders/:id/pdf – the purchase order as the supplier gets it, as a PDF
export const GET = route({ permission: 'purchasing:read', params: idParams }, async ({ scope, db, user, params }) => {
  const po = await getPurchaseOrder(scope, params.id);
  const { bytes, filename } = await renderPurchaseOrder(db, user.shopId, po);
  return new Response(new Uint8Array(bytes), {
    headers: { 'content-type': 'application/pdf', 'content-disposition': `attachment; filename="${filename}"`, 'cache-control': 'private, no-store' },
  });
});

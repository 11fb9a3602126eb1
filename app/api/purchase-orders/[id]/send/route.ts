import { idParams, route } from '@/server/api/route';
import { sendPurchaseOrder } from '@/server/buying/send';
import { sendPurchaseOrderSchema } from '@/shared/schemas/purchase-order';

// POST /api/purchase-orders/:id/send – e-mail a draft to its supplier with the PDF attached, and mark it sent
export const POST = route({ permission: 'purchasing:write', params: idParams, body: sendPurchaseOrderSchema }, async ({ db, user, params, body }) =>
  sendPurchaseOrder(db, user.shopId, user.id, params.id, body.supplierEmail || undefined),
);

import { receivePurchaseOrder } from '@/db/queries/purchase-orders';
import { idParams, route } from '@/server/api/route';
import { receivePurchaseOrderSchema } from '@/shared/schemas/purchase-order';

// POST /api/purchase-orders/:id/receive – pieces that arrived go into the stock room (movements name the order); optionally take its prices
export const POST = route({ permission: 'stock:write', params: idParams, body: receivePurchaseOrderSchema }, async ({ scope, params, body }) =>
  receivePurchaseOrder(scope, params.id, body),
);

import { createFromLowStock, createFromPlan, createManual, getPurchaseOrder, listPurchaseOrders } from '@/db/queries/purchase-orders';
import { route } from '@/server/api/route';
import { createPurchaseOrdersSchema } from '@/shared/schemas/purchase-order';

// GET /api/purchase-orders – the shop's purchase orders, newest first, with their lines and totals
export const GET = route({ permission: 'purchasing:read' }, async ({ scope }) => listPurchaseOrders(scope));

// POST /api/purchase-orders – drafts from a plan's stock to buy or from the sizes running low (one per supplier), or an empty one
export const POST = route({ permission: 'purchasing:write', body: createPurchaseOrdersSchema, status: 201 }, async ({ scope, body }) => {
  const ids =
    body.from === 'plan'
      ? await createFromPlan(scope, body.planId)
      : body.from === 'low-stock'
        ? await createFromLowStock(scope)
        : await createManual(scope, body.supplier);
  const orders = await Promise.all(ids.map((id) => getPurchaseOrder(scope, id)));
  return { orders };
});

import { getPurchaseOrder, updateDraft } from '@/db/queries/purchase-orders';
import { idParams, route } from '@/server/api/route';
import { purchaseOrderPatchSchema } from '@/shared/schemas/purchase-order';

// GET /api/purchase-orders/:id – one purchase order with its lines, what has arrived and its total
export const GET = route({ permission: 'purchasing:read', params: idParams }, async ({ scope, params }) => {
  return getPurchaseOrder(scope, params.id);
});

// PATCH /api/purchase-orders/:id – change a draft: supplier, its e-mail address, the note, the lines
export const PATCH = route({ permission: 'purchasing:write', params: idParams, body: purchaseOrderPatchSchema }, async ({ scope, params, body }) =>
  updateDraft(scope, params.id, body),
);

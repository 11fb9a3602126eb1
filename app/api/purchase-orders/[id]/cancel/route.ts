import { cancelPurchaseOrder } from '@/db/queries/purchase-orders';
import { idParams, route } from '@/server/api/route';

// POST /api/purchase-orders/:id/cancel – cancel a draft or a sent order nothing has arrived on
export const POST = route({ permission: 'purchasing:write', params: idParams }, async ({ scope, params }) => cancelPurchaseOrder(scope, params.id));

import { purchaseOrderLines, purchaseOrders, stockItems } from '@/db/schema';
import type { AuthzFixtures, AuthzRow } from './types';

let n = 9000;
/** A purchase order of "mine" with one line of a fresh sheet size, in the given status. */
const freshOrder =
  (status: 'draft' | 'sent') =>
  async ({ db, mine }: AuthzFixtures) => {
    const [item] = await db
      .insert(stockItems)
      .values({
        shopId: mine.id,
        kind: 'sheet',
        material: 'Matrix ply',
        nominalThickness: '18 mm',
        thickness: 18,
        length: 2440,
        width: 1220,
        onHand: 1,
        costCents: 4000,
        supplier: 'Matrix Supply',
      })
      .returning();
    const [po] = await db
      .insert(purchaseOrders)
      .values({
        shopId: mine.id,
        number: ++n,
        supplier: 'Matrix Supply',
        supplierEmail: 'orders@matrix.example',
        status,
        currency: 'USD',
        sentAt: status === 'sent' ? new Date() : null,
      })
      .returning();
    await db.insert(purchaseOrderLines).values({ shopId: mine.id, purchaseOrderId: po.id, stockItemId: item.id, quantity: 3, unitCostCents: 4000 });
    return { id: po.id };
  };

const buyers = (ok: number) => ({ anonymous: 401, owner: ok, estimator: ok, cutter: 403 });

export const rows: AuthzRow[] = [
  { route: '/api/purchase-orders', method: 'GET', expect: { ...buyers(200), other: 200 } },
  { route: '/api/purchase-orders', method: 'POST', body: { from: 'manual', supplier: 'Matrix Supply' }, expect: { ...buyers(201), other: 201 } },
  { route: '/api/purchase-orders/[id]', method: 'GET', target: freshOrder('draft'), expect: { ...buyers(200), other: 404 } },
  {
    route: '/api/purchase-orders/[id]',
    method: 'PATCH',
    target: freshOrder('draft'),
    body: { note: 'Deliver to the back door' },
    expect: { ...buyers(200), other: 404 },
  },
  { route: '/api/purchase-orders/[id]/send', method: 'POST', target: freshOrder('draft'), body: {}, expect: { ...buyers(200), other: 404 } },
  { route: '/api/purchase-orders/[id]/pdf', method: 'GET', target: freshOrder('draft'), expect: { ...buyers(200), other: 404 } },
  { route: '/api/purchase-orders/[id]/cancel', method: 'POST', target: freshOrder('draft'), expect: { ...buyers(200), other: 404 } },
  // Receiving changes the stock room's counts: the owner's (stock:write), as a receipt in the stock room is.
  {
    route: '/api/purchase-orders/[id]/receive',
    method: 'POST',
    target: freshOrder('sent'),
    body: { all: true },
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 404 },
  },
  { route: '/api/settings/buying', method: 'GET', expect: { ...buyers(200), other: 200 } },
  {
    route: '/api/settings/buying',
    method: 'PATCH',
    body: { lowStockDigestTime: '07:00' },
    expect: { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 200 },
  },
];

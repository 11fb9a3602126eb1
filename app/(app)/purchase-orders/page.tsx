import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { getDb } from '@/db/client';
import { getBuyingSettings, listPurchaseOrders, lowStockWithOrders } from '@/db/queries/purchase-orders';
import { getShopSettings } from '@/db/queries/shops';
import { BuyingSettingsForm } from '@/components/buying/buying-settings-form';
import { NewOrderForm, OrderLowStockButton } from '@/components/buying/make-orders';
import { PoStatusBadge } from '@/components/buying/po-status';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';
import { describeSize } from '@/lib/buying/describe';
import { reorderQuantity } from '@/lib/buying/order-lines';
import { formatMoney } from '@/lib/costing/money';
import { formatShopDateTime } from '@/lib/dates/shop-time';

export const metadata: Metadata = { title: 'Purchase orders' };

const SOURCE = { plan: 'plan', 'low-stock': 'low stock', manual: 'by hand' } as const;

export default async function PurchaseOrdersPage() {
  const user = await requirePageUser('purchasing:read');
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [settings, buying, orders, low] = await Promise.all([
    getShopSettings(scope),
    getBuyingSettings(scope),
    listPurchaseOrders(scope),
    lowStockWithOrders(scope),
  ]);
  const money = (m: number) => formatMoney(m, settings.currency);
  const when = (iso: string) => formatShopDateTime(new Date(iso), settings.timeZone);
  const canWrite = can(user.role, 'purchasing:write');
  const toOrder = low.filter((i) => reorderQuantity(i, i.onOrder) > 0);
  const suppliers = [...new Set(low.map((i) => i.supplier).filter(Boolean))].sort();

  return (
    <>
      <PageHeader
        title="Purchase orders"
        lead="What the shop orders from its suppliers: made from a plan’s stock to buy (on its Takeoff) or from the sizes running low, one draft per supplier. Edit a draft, send it to the supplier by e-mail with its PDF, then receive the delivery into the stock room."
        actions={
          <Link href="/stock" className="btn-quiet">
            Stock room
          </Link>
        }
      />

      <section aria-label="Running low" className="mb-6">
        <div className="mb-2 flex flex-wrap items-end justify-between gap-3">
          <div>
            <h2>Running low</h2>
            <p className="max-w-2xl text-sm text-graphite-mute">
              Sizes whose free count is at or below their low mark. An order brings each back up to twice its mark, less what open orders already
              bring.
            </p>
          </div>
          {canWrite && <OrderLowStockButton disabled={toOrder.length === 0} />}
        </div>
        {low.length === 0 ? (
          <EmptyState title="Nothing is running low." />
        ) : (
          <div className="card overflow-x-auto">
            <table className="data-table min-w-[36rem]" aria-label="Sizes running low">
              <thead>
                <tr>
                  <th>Stock size</th>
                  <th>Supplier</th>
                  <th className="num">Free</th>
                  <th className="num">Mark</th>
                  <th className="num">On order</th>
                  <th className="num">To order</th>
                </tr>
              </thead>
              <tbody>
                {low.map((i) => (
                  <tr key={i.id}>
                    <td>{describeSize(i, settings.units)}</td>
                    <td>{i.supplier || <span className="text-graphite-mute">none named</span>}</td>
                    <td className="num text-amber">{i.free}</td>
                    <td className="num">{i.lowStockAt}</td>
                    <td className="num">{i.onOrder}</td>
                    <td className="num font-medium">{reorderQuantity(i, i.onOrder)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>

      <section aria-label="Orders" className="mb-6">
        <div className="mb-2 flex flex-wrap items-end justify-between gap-3">
          <h2>Orders</h2>
          {canWrite && <NewOrderForm suppliers={suppliers} />}
        </div>
        {orders.length === 0 ? (
          <EmptyState title="No purchase orders yet.">Order the low stock above, or make orders from a plan on a job’s Takeoff.</EmptyState>
        ) : (
          <div className="card overflow-x-auto">
            <table className="data-table min-w-[44rem]" aria-label="Purchase orders">
              <thead>
                <tr>
                  <th>Order</th>
                  <th>Supplier</th>
                  <th>Status</th>
                  <th className="num">Lines</th>
                  <th className="num">Total</th>
                  <th>From</th>
                  <th>Made</th>
                </tr>
              </thead>
              <tbody>
                {orders.map((o) => (
                  <tr key={o.id}>
                    <td className="whitespace-nowrap font-medium">
                      <Link href={`/purchase-orders/${o.id}`}>{o.title}</Link>
                    </td>
                    <td>{o.supplier}</td>
                    <td>
                      <PoStatusBadge status={o.status} />
                    </td>
                    <td className="num">{o.lines.length}</td>
                    <td className="num">{money(o.totalCents)}</td>
                    <td className="text-sm">{o.source === 'plan' && o.planName ? <>plan “{o.planName}”</> : SOURCE[o.source]}</td>
                    <td className="whitespace-nowrap text-sm text-graphite-mute">{when(o.createdAt)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </section>

      {can(user.role, 'settings:write') && <BuyingSettingsForm initial={buying} timeZone={settings.timeZone} />}
    </>
  );
}

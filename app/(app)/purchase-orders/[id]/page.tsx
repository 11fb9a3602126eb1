import { listStock } from '@/db/queries/stock';
import { found } from '@/server/page-data';
import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getPurchaseOrder } from '@/db/queries/purchase-orders';
import { getShopSettings } from '@/db/queries/shops';
import { PurchaseOrderEditor } from '@/components/buying/purchase-order-editor';
import { PoStatusBadge } from '@/components/buying/po-status';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';
import { describeSize } from '@/lib/buying/describe';
import { formatShopDateTime } from '@/lib/dates/shop-time';
import { pieceBoardFeet } from '@/lib/stock/pricing';

export const metadata: Metadata = { title: 'Purchase order' };

export default async function PurchaseOrderPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser('purchasing:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [settings, order, items] = await found(Promise.all([getShopSettings(scope), getPurchaseOrder(scope, id.data), listStock(scope)]));
  const when = (iso: string) => formatShopDateTime(new Date(iso), settings.timeZone);
  const sizes = items.map((i) => ({
    id: i.id,
    description: describeSize(i, settings.units),
    supplier: i.supplier,
    kind: i.kind,
    costCents: i.costCents,
    boardFeetEach: i.kind === 'board' ? pieceBoardFeet(i) : null,
  }));
  const history = [
    `Made ${when(order.createdAt)}${order.source === 'plan' && order.planName ? ` from plan “${order.planName}”` : order.source === 'low-stock' ? ' from the low stock' : ''}`,
    order.sentAt && `sent ${when(order.sentAt)} to ${order.supplierEmail}`,
    order.receivedAt && `received in full ${when(order.receivedAt)}`,
    order.cancelledAt && `cancelled ${when(order.cancelledAt)}`,
  ].filter(Boolean);

  return (
    <>
      <p className="mb-2 text-sm">
        <Link href="/purchase-orders">← Purchase orders</Link>
      </p>
      <header className="mb-5 flex flex-wrap items-start justify-between gap-3">
        <div>
          <h1 className="flex flex-wrap items-center gap-2">
            {order.title} <span className="font-normal text-graphite-soft">· {order.supplier}</span> <PoStatusBadge status={order.status} />
          </h1>
          <p className="mt-1 text-sm text-graphite-mute">{history.join('; ')}.</p>
          {order.jobId && order.planName && (
            <p className="text-sm">
              <Link href={`/jobs/${order.jobId}/takeoff?plan=${order.planId}`}>The plan’s takeoff</Link>
            </p>
          )}
        </div>
        <a className="btn-quiet" href={`/api/purchase-orders/${order.id}/pdf`} download>
          Download PDF
        </a>
      </header>
      <PurchaseOrderEditor order={order} sizes={sizes} canWrite={can(user.role, 'purchasing:write')} canReceive={can(user.role, 'stock:write')} />
    </>
  );
}

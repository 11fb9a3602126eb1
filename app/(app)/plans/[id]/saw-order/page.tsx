import { scopeOf } from '@/db/scope';
import { found } from '@/server/page-data';
import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getSawOrder } from '@/db/queries/saw-steps';
import { PrintButton } from '@/components/saw-order/print-button';
import { SawCautions } from '@/components/saw-order/saw-cautions';
import { SawOrderPiece } from '@/components/saw-order/saw-order-piece';
import { PlanStatusBadge } from '@/components/saw-order/plan-status-badge';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';
import { formatLength } from '@/lib/units/format-length';
import { pieceViews } from '@/lib/saw-order/piece-views';

export const metadata: Metadata = { title: 'Saw order' };

export default async function SawOrderPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser('plans:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const order = await found(getSawOrder(scopeOf(await getDb(), user), id.data, { drafts: can(user.role, 'plans:write') }));
  const views = pieceViews(order.document.pieces, order.units, order.kerf);
  const cuts = views.reduce((n, v) => n + v.steps.length, 0);
  const atTheSaw = order.status === 'released' || order.status === 'cutting';

  return (
    <div className="saw-order">
      {/* Printed: no app chrome (the shell hides itself), a stock piece per page, 10 mm margins (app/globals.css). */}
      <Link href={`/jobs/${order.job.id}/plan`} className="text-sm text-graphite-mute print:hidden">
        ← {order.job.name}
      </Link>
      <header className="mb-4 mt-2 flex flex-wrap items-end justify-between gap-4 print:mb-2 print:mt-0">
        <div>
          <h1 className="flex items-center gap-3 print:text-xl">
            Saw order{' '}
            <span className="print:hidden">
              <PlanStatusBadge status={order.status} />
            </span>
          </h1>
          <p className="mt-1 text-sm text-graphite-soft">
            <span className="font-medium text-graphite">{order.job.name}</span> · {order.name} · {views.length} stock piece
            {views.length === 1 ? '' : 's'} · {cuts} cuts · kerf {formatLength(order.kerf, order.units)}
          </p>
          <p className="mt-1 max-w-3xl text-xs text-graphite-mute">
            Fence = the width between blade and fence, measured from the edge drawn as a heavy bar. The brick line is the cut; green pieces are the
            parts it frees, amber offcuts go on the rack.
          </p>
        </div>
        <div className="flex flex-wrap gap-2 print:hidden">
          <PrintButton />
          <a className="btn-quiet" href={`/api/plans/${order.id}/saw-order-pdf`} download>
            Download PDF
          </a>
          <Link className="btn-quiet" href={`/plans/${order.id}/tags`}>
            Part tags
          </Link>
          {atTheSaw && can(user.role, 'sawsteps:tick') && (
            <Link className="btn-accent" href={`/shop-floor/${order.id}`}>
              Cut on the shop floor
            </Link>
          )}
        </div>
      </header>
      <SawCautions compact screenOnly />
      {views.length === 0 ? (
        <p className="card px-4 py-6 text-sm text-graphite-mute">This plan places no parts, so there is nothing to cut.</p>
      ) : (
        views.map((v, i) => <SawOrderPiece key={v.index} view={v} first={i === 0} />)
      )}
    </div>
  );
}

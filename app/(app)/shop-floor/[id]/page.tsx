import { found } from '@/server/page-data';
import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getSawOrder, getStepTicks } from '@/db/queries/saw-steps';
import { PlanStatusBadge } from '@/components/saw-order/plan-status-badge';
import { SawCautions } from '@/components/saw-order/saw-cautions';
import { CuttingView } from '@/components/shop-floor/cutting-view';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';
import { pieceViews } from '@/lib/saw-order/piece-views';

export const metadata: Metadata = { title: 'Cutting' };

export default async function CuttingPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser('sawsteps:tick');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const db = await getDb();
  const scope = scopeOf(db, user);
  // The shop floor shows released work only, whoever is looking.
  const [order, ticks] = await found(Promise.all([getSawOrder(scope, id.data, { drafts: false }), getStepTicks(scope, id.data)]));
  const atTheSaw = order.status === 'released' || order.status === 'cutting';

  return (
    <div>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <Link href="/shop-floor" className="text-sm text-graphite-mute">
          ← Shop floor
        </Link>
        <Link className="btn-quiet px-3 py-1.5" href={`/plans/${order.id}/saw-order`}>
          Printable saw order
        </Link>
      </div>
      <header className="mb-3 mt-1">
        <h1 className="flex flex-wrap items-center gap-x-3 gap-y-1">
          {order.job.name} <PlanStatusBadge status={ticks.status} />
        </h1>
        <p className="text-sm text-graphite-mute">{order.name}</p>
      </header>
      {/* A line of the cautions up top keeps the cut on screen; the whole list follows the cuts. */}
      <p className="mb-3 rounded-md border border-amber/40 bg-amber-wash px-3 py-1.5 text-sm text-graphite-soft">
        Guard on, push stick ready: <a href="#saw-safety">the cautions</a> are below.
      </p>
      {atTheSaw ? (
        <CuttingView
          planId={order.id}
          views={pieceViews(order.document.pieces, order.units, order.kerf)}
          initial={ticks}
          canFinish={can(user.role, 'plans:finish')}
        />
      ) : (
        <p className="card px-4 py-6">This plan is {order.status}: there is nothing left to cut on it.</p>
      )}
      <div id="saw-safety" className="mt-6">
        <SawCautions compact />
      </div>
    </div>
  );
}

import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { getDb } from '@/db/client';
import { getPlan } from '@/db/queries/plan-document';
import { listPlansByStatus } from '@/db/queries/plans';
import { countStepTicks } from '@/db/queries/saw-steps';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { PlanStatusBadge } from '@/components/saw-order/plan-status-badge';
import { SawCautions } from '@/components/saw-order/saw-cautions';
import { ProgressBar } from '@/components/shop-floor/progress-bar';
import { requirePageUser } from '@/server/auth/session';

export const metadata: Metadata = { title: 'Shop floor' };

export default async function ShopFloorPage() {
  const user = await requirePageUser('sawsteps:tick');
  const db = await getDb();
  const scope = scopeOf(db, user);
  const plans = await listPlansByStatus(scope, ['released', 'cutting']);
  const ticks = await countStepTicks(
    scope,
    plans.map((p) => p.id),
  );
  // Oldest released work first: the list comes newest-changed first.
  const queue = await Promise.all(
    [...plans].reverse().map(async (p) => {
      const doc = (await getPlan(scope, p.id)).document;
      const total = doc?.pieces.reduce((n, piece) => n + (piece.sawOrder?.length ?? 0), 0) ?? 0;
      return { ...p, pieces: doc?.pieces.length ?? 0, total, done: ticks.get(p.id) ?? 0 };
    }),
  );
  return (
    <>
      <PageHeader title="Shop floor" lead="Released plans waiting at the saw, oldest work first. Open one to cut it step by step." />
      <SawCautions />
      {queue.length === 0 ? (
        <EmptyState title="Nothing to cut right now.">Plans appear here once an estimator or the owner releases them.</EmptyState>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2" aria-label="Plans to cut">
          {queue.map((p) => (
            <li key={p.id}>
              <Link
                href={`/shop-floor/${p.id}`}
                className="card block p-5 no-underline transition hover:border-oak hover:shadow-sm"
                data-testid="queue-plan"
              >
                <div className="flex items-start justify-between gap-3">
                  <div>
                    <div className="text-xl font-semibold text-graphite">{p.jobName}</div>
                    <div className="text-sm text-graphite-mute">
                      {p.name} · {p.pieces} stock piece{p.pieces === 1 ? '' : 's'}
                    </div>
                  </div>
                  <PlanStatusBadge status={p.status} />
                </div>
                <div className="mt-4">
                  <ProgressBar done={p.done} total={p.total} label={`${p.done} of ${p.total} cuts done`} />
                </div>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}

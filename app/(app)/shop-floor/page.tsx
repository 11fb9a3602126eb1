import type { Metadata } from 'next';
import { getDb } from '@/db/client';
import { listPlansByStatus } from '@/db/queries/plans';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { StatusBadge } from '@/components/ui/status-badge';
import { requirePageUser } from '@/lib/auth/session';
import { SAW_CAUTIONS } from '@/lib/safety';

export const metadata: Metadata = { title: 'Shop floor' };

export default async function ShopFloorPage() {
  const user = await requirePageUser('sawsteps:tick');
  const queue = await listPlansByStatus(await getDb(), user.shopId, ['released', 'cutting']);
  return (
    <>
      <PageHeader title="Shop floor" lead="Released plans waiting at the saw, oldest work first." />
      <aside className="mb-6 rounded-lg border border-amber/40 bg-amber-wash px-5 py-4" aria-label="Saw safety">
        <p className="mb-2 font-semibold text-graphite">Before you cut</p>
        <ul className="list-disc space-y-1 pl-5 text-sm text-graphite-soft">
          {SAW_CAUTIONS.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </aside>
      {queue.length === 0 ? (
        <EmptyState title="Nothing to cut right now.">Plans appear here once an estimator or the owner releases them.</EmptyState>
      ) : (
        <ul className="grid gap-3 md:grid-cols-2">
          {queue.map((p) => (
            <li key={p.id} className="card flex items-center justify-between p-5">
              <div>
                <div className="text-lg font-semibold">{p.jobName}</div>
                <div className="text-sm text-graphite-mute">{p.name}</div>
              </div>
              <StatusBadge tone={p.status === 'cutting' ? 'warn' : 'accent'}>{p.status === 'cutting' ? 'Cutting' : 'Released'}</StatusBadge>
            </li>
          ))}
        </ul>
      )}
    </>
  );
}

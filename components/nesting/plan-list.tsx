'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { EmptyState } from '@/components/ui/empty-state';
import { StatusBadge, type Tone } from '@/components/ui/status-badge';
import { call } from '@/client/api';
import { formatMoney } from '@/lib/money';
import type { JobPlanSummary } from '@/shared/wire/plans';
import { formatShopDateTime } from '@/lib/dates/shop-time';

const TONE: Record<JobPlanSummary['status'], Tone> = { draft: 'neutral', released: 'accent', cutting: 'warn', done: 'good', cancelled: 'bad' };
const LABEL: Record<JobPlanSummary['status'], string> = {
  draft: 'Draft',
  released: 'Released',
  cutting: 'Cutting',
  done: 'Done',
  cancelled: 'Cancelled',
};

/** The job's plans, newest first, with status, yield and (for those allowed) cost. */
export function PlanList({ jobId, currency, showPrices, timeZone }: { jobId: string; currency: string; showPrices: boolean; timeZone: string }) {
  const plans = useQuery({ queryKey: ['plans', jobId], queryFn: () => call('GET /api/jobs/:id/plans', { params: { id: jobId } }) });
  if (plans.isPending) return <p className="text-sm text-graphite-mute">Loading plans…</p>;
  if (plans.isError)
    return (
      <p className="field-error" role="alert">
        Could not load the plans: {plans.error.message}
      </p>
    );
  if (plans.data.length === 0) return <EmptyState title="No plans yet.">Nest the cut list below and save the result as a draft plan.</EmptyState>;
  return (
    <div className="card overflow-x-auto">
      <table className="data-table" aria-label="Plans">
        <thead>
          <tr>
            <th>Plan</th>
            <th>Status</th>
            <th className="num">Stock pieces</th>
            <th className="num">Yield</th>
            {showPrices && <th className="num">Cost</th>}
            <th className="num">Not placed</th>
            <th>Saved</th>
            <th></th>
          </tr>
        </thead>
        <tbody>
          {plans.data.map((p) => (
            <tr key={p.id}>
              <td className="min-w-40 font-medium">
                <Link href={`/jobs/${jobId}/plan/${p.id}`}>{p.name}</Link>
                {p.recutPlan && (
                  <span className="ml-2 whitespace-nowrap">
                    <StatusBadge tone="warn">Re-cuts</StatusBadge>
                  </span>
                )}
              </td>
              <td>
                <StatusBadge tone={TONE[p.status]}>{LABEL[p.status]}</StatusBadge>
              </td>
              <td className="num">{p.pieces}</td>
              <td className="num">{p.yieldRatio === null ? '—' : `${(p.yieldRatio * 100).toFixed(1)} %`}</td>
              {showPrices && <td className="num">{p.costCents === null ? '—' : formatMoney(p.costCents, currency)}</td>}
              <td className={`num ${p.unplaced ? 'text-brick' : ''}`}>{p.unplaced}</td>
              <td className="whitespace-nowrap text-graphite-mute">{formatShopDateTime(new Date(p.updatedAt), timeZone)}</td>
              <td>{p.status !== 'draft' && <Link href={`/plans/${p.id}/saw-order`}>Saw order</Link>}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

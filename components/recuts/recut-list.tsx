'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { ActionError } from '@/components/ui/field';
import { EmptyState } from '@/components/ui/empty-state';
import { StatusBadge, type Tone } from '@/components/ui/status-badge';
import { call } from '@/client/api';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import { recutLabel } from '@/lib/recuts/recuts';
import { formatLength } from '@/lib/units/format-length';
import { RECUT_STATUS_LABELS, type RecutStatus, type RecutView } from '@/shared/schemas/recut';
import type { ShopUnits } from '@/shared/schemas/units';

const TONE: Record<RecutStatus, Tone> = { open: 'warn', planned: 'accent', cut: 'good', spoiled: 'bad', cancelled: 'neutral' };

/**
 * The job's re-cut list: every part that came off the saw damaged, with its size, material, grain and why; the open
 * ones first. Those who nest may nest the open ones (offcuts first) or cancel one with a reason.
 */
export function RecutList({ jobId, units, canNest, canCancel }: { jobId: string; units: ShopUnits; canNest: boolean; canCancel: boolean }) {
  const recuts = useQuery({ queryKey: ['recuts', jobId], queryFn: () => call('GET /api/jobs/:id/recuts', { params: { id: jobId } }) });
  const len = (mm: number) => formatLength(mm, units);
  // Stock is named by its exact thickness (18 mm, not ≈11/16″), as everywhere else.
  const thick = (mm: number) => exactLengthText(mm, units);
  if (recuts.isPending) return <p className="text-sm text-graphite-mute">Loading re-cuts…</p>;
  if (recuts.isError)
    return (
      <p className="field-error" role="alert">
        Could not load the re-cuts: {recuts.error.message}
      </p>
    );
  const open = recuts.data.filter((r) => r.status === 'open');
  const planned = recuts.data.filter((r) => r.status === 'planned');
  if (!recuts.data.length)
    return <EmptyState title="No re-cuts.">A part marked damaged when a plan is finished lands here, to be nested again on the offcuts.</EmptyState>;
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-center gap-3">
        <p className="text-sm text-graphite-soft" data-testid="recut-summary">
          {open.length ? `${open.length} to re-cut` : 'Nothing left to re-cut'}
          {planned.length > 0 && ` · ${planned.length} in a released plan`}
        </p>
        {canNest && open.length > 0 && (
          <Link href={`/jobs/${jobId}/plan?nest=recuts#nest`} className="btn-accent">
            Nest the re-cuts
          </Link>
        )}
      </div>
      <div className="card overflow-x-auto">
        <table className="data-table" aria-label="Re-cuts">
          <thead>
            <tr>
              <th>Part</th>
              <th className="num">Qty</th>
              <th className="num">Length × width</th>
              <th>Reason</th>
              <th>Status</th>
              {canCancel && (
                <th>
                  <span className="sr-only">Actions</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {recuts.data.map((r) => (
              <RecutRow key={r.id} recut={r} jobId={jobId} len={len} thick={thick} canCancel={canCancel} />
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

function RecutRow({
  recut: r,
  jobId,
  len,
  thick,
  canCancel,
}: {
  recut: RecutView;
  jobId: string;
  len: (mm: number) => string;
  thick: (mm: number) => string;
  canCancel: boolean;
}) {
  const [cancelling, setCancelling] = useState(false);
  const [reason, setReason] = useState('');
  const queryClient = useQueryClient();
  const router = useRouter();
  const cancel = useMutation({
    mutationFn: () => call('POST /api/recuts/:id/cancel', { params: { id: r.id }, body: { reason } }),
    onSuccess: () => {
      setCancelling(false);
      void queryClient.invalidateQueries({ queryKey: ['recuts', jobId] });
      // The job may be done now: its header reads the status on the server.
      router.refresh();
    },
  });
  const closed = r.status !== 'open' && r.status !== 'planned';
  return (
    <tr data-testid="recut" data-status={r.status} className={closed ? 'text-graphite-mute' : undefined}>
      <td className="min-w-36">
        <span className="font-medium whitespace-nowrap">{recutLabel(r)}</span>
        <span className="block text-xs text-graphite-mute">
          {thick(r.thickness)} {r.material}
        </span>
      </td>
      <td className="num">{r.quantity}</td>
      <td className="num">
        <span className="whitespace-nowrap">
          {len(r.length)} × {len(r.width)}
        </span>
        <span className="block font-sans text-xs text-graphite-mute">{r.grain === 'any' ? 'may turn' : 'grain along the length'}</span>
      </td>
      <td className="min-w-48">
        {r.reason}
        <span className="block text-xs text-graphite-mute">
          {r.sourcePlan ? `finishing “${r.sourcePlan.name}”` : 'at the saw'}
          {r.createdBy ? ` · ${r.createdBy}` : ''}
        </span>
      </td>
      <td>
        <span className="whitespace-nowrap">
          <StatusBadge tone={TONE[r.status]}>{RECUT_STATUS_LABELS[r.status]}</StatusBadge>
        </span>
        {r.recutPlan && (r.status === 'planned' || r.status === 'cut' || r.status === 'spoiled') && (
          <Link href={`/plans/${r.recutPlan.id}/saw-order`} className="block text-xs">
            {r.recutPlan.name}
          </Link>
        )}
        {r.status === 'cancelled' && r.cancelReason && <span className="block text-xs">{r.cancelReason}</span>}
      </td>
      {canCancel && (
        <td className="min-w-48">
          {r.status === 'open' && !cancelling && (
            <button type="button" className="btn-quiet px-3 py-1" onClick={() => setCancelling(true)}>
              Cancel…
            </button>
          )}
          {cancelling && (
            <form
              className="space-y-2"
              onSubmit={(e) => {
                e.preventDefault();
                cancel.mutate();
              }}
            >
              <label htmlFor={`cancel-${r.id}`} className="field-label">
                Why is it not needed?
              </label>
              <input
                id={`cancel-${r.id}`}
                className="field-input"
                value={reason}
                onChange={(e) => setReason(e.target.value)}
                placeholder="Made from a scrap at the bench"
                autoFocus
              />
              <div className="flex flex-wrap gap-2">
                <button type="submit" className="btn-danger px-3 py-1" disabled={cancel.isPending}>
                  Cancel re-cut
                </button>
                <button type="button" className="btn-quiet px-3 py-1" onClick={() => setCancelling(false)}>
                  Keep it
                </button>
              </div>
              <ActionError error={cancel.error} />
            </form>
          )}
        </td>
      )}
    </tr>
  );
}

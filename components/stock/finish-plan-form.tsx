'use client';

import Link from 'next/link';
import { useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import { call } from '@/client/api';
import { RECUT_REASONS } from '@/lib/recuts/recuts';
import { formatLength } from '@/lib/units/format-length';
import { JOB_STATUS_LABELS } from '@/shared/schemas/job';
import type { ShopUnits } from '@/shared/schemas/units';
import { ActionError } from '@/components/ui/field';
import type { FinishResult } from '@/shared/wire/plans';
import type { FinishPlanInput } from '@/shared/schemas/stock';

export interface FinishPiece {
  index: number;
  title: string;
  offcuts: { index: number; w: number; h: number; keepable: boolean }[];
  parts: { partId: string; instance: number; label: string; w: number; h: number }[];
}

const pct = (r: number) => `${(r * 100).toFixed(1)} %`;

/**
 * The cutter's last step: where each offcut goes on the rack (or that it was not kept), which parts came off the saw
 * damaged and why (each goes on the job's re-cut list), then Done. Costs are never asked for here: the server works
 * them out from the plan.
 */
export function FinishPlanForm({
  planId,
  pieces,
  units,
  defaultLocation,
}: {
  planId: string;
  pieces: FinishPiece[];
  units: ShopUnits;
  defaultLocation: string;
}) {
  const len = (mm: number) => formatLength(mm, units);
  const [locations, setLocations] = useState<Record<string, string>>({});
  const [dropped, setDropped] = useState<Set<string>>(new Set());
  const [damaged, setDamaged] = useState<Set<string>>(new Set());
  const [reasons, setReasons] = useState<Record<string, string>>({});
  const [allTo, setAllTo] = useState(defaultLocation);
  const [result, setResult] = useState<FinishResult | null>(null);
  // No page refresh on success: the page would re-render as a done plan and hide this summary.
  const done = useMutation({
    mutationFn: (body: FinishPlanInput) => call('POST /api/plans/:id/done', { params: { id: planId }, body }),
    onSuccess: setResult,
  });
  const toggle = (set: Set<string>, key: string, update: (s: Set<string>) => void) => {
    const next = new Set(set);
    if (next.has(key)) next.delete(key);
    else next.add(key);
    update(next);
  };

  if (result) {
    return (
      <div className="card space-y-2 p-5" role="status" data-testid="finish-result">
        <p className="text-lg font-semibold">Plan done.</p>
        <p className="text-sm">
          Yield {pct(result.yieldRatio)} · waste {pct(result.wasteRatio)}
          {result.spoiledRatio > 0 && ` (${pct(result.spoiledRatio)} in damaged parts)`} · {result.offcuts.length} offcut
          {result.offcuts.length === 1 ? '' : 's'} on the rack.
        </p>
        {result.recutsAdded > 0 && (
          <p className="text-sm font-medium" data-testid="finish-recuts">
            {result.recutsAdded} damaged part{result.recutsAdded === 1 ? '' : 's'} on the job’s re-cut list.
          </p>
        )}
        {result.recutsClosed > 0 && (
          <p className="text-sm">
            {result.recutsClosed} re-cut{result.recutsClosed === 1 ? '' : 's'} cut and closed.
          </p>
        )}
        {result.jobStatus && <p className="text-sm text-graphite-soft">The job is now {JOB_STATUS_LABELS[result.jobStatus].toLowerCase()}.</p>}
        <ul className="text-sm text-graphite-soft">
          {result.offcuts.map((o) => (
            <li key={o.id}>
              {len(o.length)} × {len(o.width)} → {o.location || 'no location'}
            </li>
          ))}
        </ul>
        <div className="flex flex-wrap gap-2">
          <Link href="/stock?view=rack" className="btn-accent">
            See the offcut rack
          </Link>
          {result.recutsAdded > 0 && (
            <Link href={`/jobs/${result.jobId}/plan#recuts`} className="btn-quiet">
              See the re-cut list
            </Link>
          )}
        </div>
      </div>
    );
  }

  function submit() {
    done.mutate({
      offcuts: pieces.flatMap((p) =>
        p.offcuts
          .filter((o) => o.keepable)
          .map((o) => {
            const key = `${p.index}:${o.index}`;
            return { piece: p.index, index: o.index, keep: !dropped.has(key), location: (locations[key] ?? allTo).trim() };
          }),
      ),
      damaged: pieces.flatMap((p) =>
        p.parts
          .filter((pt) => damaged.has(`${p.index}:${pt.partId}:${pt.instance}`))
          .map((pt) => ({
            piece: p.index,
            partId: pt.partId,
            instance: pt.instance,
            reason: (reasons[`${p.index}:${pt.partId}:${pt.instance}`] ?? '').trim(),
          })),
      ),
    });
  }

  const offcutCount = pieces.reduce((n, p) => n + p.offcuts.filter((o) => o.keepable).length, 0);
  return (
    <form
      className="space-y-5"
      aria-label="Finish the plan"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <div className="card flex flex-wrap items-end gap-3 p-4">
        <div className="w-64 max-w-full">
          <label htmlFor="all-location" className="field-label">
            Rack location for offcuts
          </label>
          <input id="all-location" className="field-input" value={allTo} onChange={(e) => setAllTo(e.target.value)} placeholder="Offcut bin 1" />
        </div>
        <p className="text-sm text-graphite-mute">
          {offcutCount} offcut{offcutCount === 1 ? '' : 's'} worth keeping. Set a different place per offcut below, or untick one that was not kept.
        </p>
      </div>
      {pieces.map((p) => (
        <section key={p.index} className="card p-4" aria-label={p.title}>
          <h2 className="mb-2 text-base">{p.title}</h2>
          <div className="grid gap-4 md:grid-cols-2">
            <div>
              <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-graphite-mute">Offcuts</h3>
              {p.offcuts.filter((o) => o.keepable).length === 0 && <p className="text-sm text-graphite-mute">None worth keeping.</p>}
              <ul className="space-y-2">
                {p.offcuts
                  .filter((o) => o.keepable)
                  .map((o) => {
                    const key = `${p.index}:${o.index}`;
                    return (
                      <li key={key} className="flex flex-wrap items-center gap-2 text-sm" data-testid="finish-offcut">
                        <label className="flex min-h-11 items-center gap-2">
                          <input type="checkbox" className="h-5 w-5" checked={!dropped.has(key)} onChange={() => toggle(dropped, key, setDropped)} />
                          <span className="num min-w-40 whitespace-nowrap text-left" data-testid="finish-offcut-size">
                            {len(o.w)} × {len(o.h)}
                          </span>
                        </label>
                        <input
                          className="field-input w-48 max-w-full py-1"
                          aria-label={`Location for offcut ${len(o.w)} × ${len(o.h)}`}
                          placeholder={allTo || 'location'}
                          value={locations[key] ?? ''}
                          onChange={(e) => setLocations({ ...locations, [key]: e.target.value })}
                          disabled={dropped.has(key)}
                        />
                      </li>
                    );
                  })}
              </ul>
            </div>
            <div>
              <h3 className="mb-1 text-xs font-semibold uppercase tracking-wide text-graphite-mute">Damaged at the saw (goes on the re-cut list)</h3>
              <ul className="grid gap-x-3 lg:grid-cols-2">
                {p.parts.map((pt) => {
                  const key = `${p.index}:${pt.partId}:${pt.instance}`;
                  const name = `${pt.label} #${pt.instance}`;
                  return (
                    // A damaged part takes the whole row, so what happened to it has room to be typed.
                    <li key={key} data-testid="finish-part" className={damaged.has(key) ? 'lg:col-span-2' : undefined}>
                      <label className="flex min-h-11 items-center gap-2 text-sm">
                        <input type="checkbox" className="h-5 w-5" checked={damaged.has(key)} onChange={() => toggle(damaged, key, setDamaged)} />
                        <span>
                          {pt.label} <span className="whitespace-nowrap">#{pt.instance}</span>{' '}
                          <span className="whitespace-nowrap text-xs text-graphite-mute">
                            {len(pt.w)} × {len(pt.h)}
                          </span>
                        </span>
                      </label>
                      {damaged.has(key) && (
                        <input
                          className="field-input mb-2 py-1"
                          list="recut-reasons"
                          aria-label={`What happened to ${name}`}
                          placeholder="What happened (tear-out, chipped edge…)"
                          value={reasons[key] ?? ''}
                          onChange={(e) => setReasons({ ...reasons, [key]: e.target.value })}
                          maxLength={200}
                        />
                      )}
                    </li>
                  );
                })}
              </ul>
            </div>
          </div>
        </section>
      ))}
      <datalist id="recut-reasons">
        {RECUT_REASONS.map((r) => (
          <option key={r} value={r} />
        ))}
      </datalist>
      <ActionError error={done.error} />
      <button type="submit" className="btn-accent px-6 py-3 text-base" disabled={done.isPending}>
        {done.isPending ? 'Recording…' : 'Mark the plan done'}
      </button>
    </form>
  );
}

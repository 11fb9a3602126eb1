import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getShopSettings } from '@/db/queries/shops';
import { PieceMap } from '@/components/part-tags/piece-map';
import { PlanStatusBadge } from '@/components/saw-order/plan-status-badge';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';
import { formatLength } from '@/lib/units/format-length';
import { getPartPage } from '@/db/queries/part-page';
import { found } from '@/server/page-data';

export const metadata: Metadata = { title: 'Part' };

const query = z.object({ plan: z.uuid().optional().catch(undefined), instance: z.coerce.number().int().min(1).optional().catch(undefined) });

export default async function PartPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string>> }) {
  const user = await requirePageUser('jobs:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [data, settings] = await found(Promise.all([getPartPage(scope, id.data, { drafts: can(user.role, 'plans:write') }), getShopSettings(scope)]));
  const { plan: planId, instance } = query.parse(await searchParams);
  const { part, job, plans } = data;
  const len = (mm: number) => formatLength(mm, settings.units);
  const fromTag = plans.find((p) => p.id === planId)?.places.find((pl) => pl.instance === instance);

  return (
    <div className="max-w-4xl">
      {job && (
        <Link href={`/jobs/${job.id}`} className="text-sm text-graphite-mute">
          ← {job.name}
        </Link>
      )}
      <header className="mb-5 mt-2">
        <h1>
          {part.label}
          {instance && <span className="ml-2 font-normal text-graphite-mute">#{instance}</span>}
        </h1>
        <p className="mt-1 text-sm text-graphite-soft">
          {job ? `${job.name}${job.customer ? ` · ${job.customer}` : ''}` : 'Job'} ·{' '}
          {data.recutOf ? `a re-cut of ${data.recutOf}, damaged at the saw` : `${part.quantity} in the cut list`}
        </p>
      </header>

      <dl className="card mb-6 grid grid-cols-2 gap-x-6 gap-y-3 p-5 sm:grid-cols-4">
        <Fact label="Length (along the grain)" value={len(part.length)} mono />
        <Fact label="Width" value={len(part.width)} mono />
        <Fact label="Thickness" value={exactLengthText(part.thickness, settings.units)} mono />
        <Fact label="Material" value={part.material} />
        <Fact label="Grain" value={part.grain === 'along-length' ? 'Along the length' : 'Either way'} />
        {part.jointAllowance > 0 && <Fact label="Joint allowance (in the length)" value={len(part.jointAllowance)} mono />}
        {part.notes && <Fact label="Notes" value={part.notes} wide />}
      </dl>

      {fromTag && planId && (
        <section className="card mb-6 p-5" aria-labelledby="from-tag">
          <h2 id="from-tag" className="mb-1">
            This one: #{instance}, cut from piece {fromTag.pieceName}
          </h2>
          <p className="mb-3 text-sm text-graphite-mute">The part is marked on its {fromTag.piece.kind === 'board' ? 'Board map' : 'Sheet map'}.</p>
          <PieceMap piece={fromTag.piece} partId={part.id} instance={instance} className="h-auto w-full max-w-xl" />
          <div className="mt-3 flex flex-wrap gap-2">
            <Link className="btn-quiet" href={`/plans/${planId}/saw-order#piece-${fromTag.pieceName}`}>
              Saw order for piece {fromTag.pieceName}
            </Link>
          </div>
        </section>
      )}

      <section aria-labelledby="in-plans">
        <h2 id="in-plans" className="mb-3">
          In plans
        </h2>
        {plans.length === 0 ? (
          <p className="card px-4 py-6 text-sm text-graphite-mute">No plan of this job holds the part yet.</p>
        ) : (
          <ul className="space-y-3">
            {plans.map((p) => (
              <li key={p.id} className="card p-4">
                <div className="mb-2 flex items-center justify-between gap-3">
                  <Link href={`/plans/${p.id}/saw-order`} className="font-medium">
                    {p.name}
                  </Link>
                  <PlanStatusBadge status={p.status} />
                </div>
                <ul className="flex flex-wrap gap-2 text-sm">
                  {p.places.map((pl) => (
                    <li
                      key={pl.instance}
                      className={`rounded border px-2 py-0.5 ${p.id === planId && pl.instance === instance ? 'border-oak bg-oak-wash' : 'border-paper-edge'}`}
                    >
                      #{pl.instance} on piece <Link href={`/plans/${p.id}/saw-order#piece-${pl.pieceName}`}>{pl.pieceName}</Link>
                    </li>
                  ))}
                  {p.unplaced.map((u) => (
                    <li key={`u${u.instance}`} className="rounded border border-brick/40 bg-brick-wash px-2 py-0.5 text-brick">
                      #{u.instance} not placed: {u.message}
                    </li>
                  ))}
                </ul>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}

function Fact({ label, value, mono = false, wide = false }: { label: string; value: string; mono?: boolean; wide?: boolean }) {
  return (
    <div className={wide ? 'col-span-2 sm:col-span-4' : ''}>
      <dt className="text-xs text-graphite-mute">{label}</dt>
      <dd className={mono ? 'font-mono text-lg font-medium' : 'font-medium'}>{value}</dd>
    </div>
  );
}

import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { OrderFromPlanButton } from '@/components/buying/make-orders';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getShopSettings } from '@/db/queries/shops';
import { getTakeoff, takeoffPlans } from '@/db/queries/takeoff';
import { CancelPlanButton } from '@/components/stock/cancel-plan-button';
import { ReleasePlanButton } from '@/components/stock/release-plan-button';
import { AllowanceTable, TakeoffTable } from '@/components/takeoff/takeoff-table';
import { EmptyState } from '@/components/ui/empty-state';
import { FigureCard as Figure } from '@/components/ui/figure-card';
import { StatusBadge } from '@/components/ui/status-badge';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';
import { formatMoney } from '@/lib/money';
import { formatArea } from '@/lib/units/format-area';
import { formatLength } from '@/lib/units/format-length';

export const metadata: Metadata = { title: 'Takeoff' };

export default async function TakeoffPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ plan?: string }> }) {
  const user = await requirePageUser('prices:read');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const chosen = z.uuid().safeParse((await searchParams).plan);
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [takeoff, settings, choices] = await Promise.all([
    getTakeoff(scope, id.data, chosen.success ? chosen.data : undefined),
    getShopSettings(scope),
    takeoffPlans(scope, id.data),
  ]);
  if (!takeoff) {
    return (
      <EmptyState title="No plan yet.">
        Nest the job first: the takeoff reads the latest plan. <Link href={`/jobs/${id.data}/plan`}>Go to Plan</Link>
      </EmptyState>
    );
  }
  const len = (mm: number) => formatLength(mm, settings.units);
  const area = (mm2: number) => formatArea(mm2, settings.units);
  const money = (cents: number) => formatMoney(cents, settings.currency);
  const describe = Object.fromEntries(
    [...takeoff.pull, ...takeoff.buy].map((l) => [
      l.stockId,
      `${l.material} ${l.nominalThickness || len(l.thickness)} ${len(l.length)} × ${len(l.width)}`,
    ]),
  );
  const { totals } = takeoff;

  return (
    <div>
      {choices.length > 1 && (
        <nav aria-label="Plans of this job" className="mb-4 flex flex-wrap items-center gap-2 text-sm">
          <span className="text-graphite-mute">Plans:</span>
          {choices.map((c) => (
            <Link
              key={c.id}
              href={`?plan=${c.id}`}
              aria-current={c.id === takeoff.plan.id ? 'page' : undefined}
              className={`rounded-full border px-3 py-1 no-underline ${c.id === takeoff.plan.id ? 'border-graphite bg-graphite text-paper' : 'border-paper-edge bg-white text-graphite-soft hover:bg-paper-deep'}`}
            >
              {c.name} · {c.status}
            </Link>
          ))}
        </nav>
      )}
      <div className="mb-5 flex flex-wrap items-start justify-between gap-4">
        <div>
          <h2 className="flex items-center gap-2">
            Takeoff for “{takeoff.plan.name}”{' '}
            <StatusBadge tone={takeoff.plan.status === 'draft' ? 'neutral' : 'accent'}>{takeoff.plan.status}</StatusBadge>
          </h2>
          <p className="mt-1 max-w-2xl text-sm text-graphite-mute">
            From the job’s latest plan (or the one picked above): every sheet and board its parts are laid on, priced at cost. The spoilage allowance
            ({takeoff.allowancePercent} %, Shop settings) covers parts spoiled at the saw and defects in the stock: it is taken once on each
            material’s area or board feet, priced at that share of its cost, and rounded up to whole pieces to have ready.
          </p>
        </div>
        {takeoff.plan.status === 'draft' && can(user.role, 'plans:release') && <ReleasePlanButton planId={takeoff.plan.id} describe={describe} />}
        {(takeoff.plan.status === 'released' || takeoff.plan.status === 'cutting') && can(user.role, 'plans:release') && (
          <CancelPlanButton planId={takeoff.plan.id} />
        )}
      </div>

      <div className="mb-6 grid gap-3 sm:grid-cols-4">
        <Figure label="Material cost" value={money(totals.costCents)} />
        <Figure
          label={`With the ${takeoff.allowancePercent} % allowance`}
          value={money(totals.costWithAllowanceCents)}
          testId="takeoff-total-allowance"
        />
        <Figure
          label={totals.boardFeet > 0 && totals.areaMm2 > 0 ? 'Sheet area · board feet' : totals.boardFeet > 0 ? 'Board feet' : 'Sheet area'}
          value={
            [totals.areaMm2 > 0 ? area(totals.areaMm2) : '', totals.boardFeet > 0 ? `${totals.boardFeet.toFixed(2)} bf` : '']
              .filter(Boolean)
              .join(' · ') || '—'
          }
        />
        <Figure
          label="Stock room"
          value={
            !totals.covered
              ? 'Cannot cover it now'
              : totals.coveredReady || takeoff.allowancePercent === 0
                ? 'Can cover it now'
                : 'Can cover it now, not the allowance'
          }
          tone={`font-sans text-lg ${!totals.covered ? 'text-brick' : totals.coveredReady ? 'text-sage' : 'text-amber'}`}
          testId="takeoff-covered"
        />
      </div>

      {takeoff.pull.length > 0 && <TakeoffTable title="Pull from stock" lines={takeoff.pull} len={len} area={area} money={money} />}
      {takeoff.buy.length > 0 && <TakeoffTable title="To buy" lines={takeoff.buy} len={len} area={area} money={money} />}
      {(takeoff.buy.length > 0 || !totals.covered) && takeoff.plan.status !== 'done' && can(user.role, 'purchasing:write') && (
        <OrderFromPlanButton planId={takeoff.plan.id} />
      )}
      {takeoff.allowancePercent > 0 && takeoff.allowances.length > 0 && (
        <AllowanceTable
          allowances={takeoff.allowances}
          lines={[...takeoff.pull, ...takeoff.buy]}
          percent={takeoff.allowancePercent}
          len={len}
          area={area}
          money={money}
        />
      )}
      {takeoff.gone.length > 0 && (
        <p className="field-error mb-4" role="alert">
          The plan uses stock no longer in the stock room ({takeoff.gone.join(', ')}). <Link href={`/jobs/${id.data}/plan`}>Nest again</Link>.
        </p>
      )}
      {takeoff.unplaced.length > 0 && (
        <section className="card border-brick/40 p-4" aria-label="Parts not placed">
          <h2 className="mb-2 text-brick">Parts not placed ({takeoff.unplaced.length})</h2>
          <ul className="ml-4 list-disc text-sm">
            {takeoff.unplaced.map((u) => (
              <li key={`${u.partId}:${u.instance}`}>
                {u.label || u.partId} #{u.instance}: {u.message}
              </li>
            ))}
          </ul>
        </section>
      )}
    </div>
  );
}

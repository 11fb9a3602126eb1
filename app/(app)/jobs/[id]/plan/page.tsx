import type { Metadata } from 'next';
import Link from 'next/link';
import { NestPanel } from '@/components/nesting/nest-panel';
import { PlanList } from '@/components/nesting/plan-list';
import { RecutList } from '@/components/recuts/recut-list';
import { can } from '@/lib/auth/permissions';
import { jobSection } from '../job-section';

export const metadata: Metadata = { title: 'Plan' };

/** The job's Plan section: its plans, its re-cut list, and (for those who may) a new Nest of the cut list or of the re-cuts. */
export default async function JobPlanPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ nest?: string }> }) {
  const { user, jobId, shop } = await jobSection(params, 'plans:read');
  const showPrices = can(user.role, 'prices:read');
  const nestFor = (await searchParams).nest === 'recuts' ? 'recuts' : 'cut-list';
  return (
    <div className="space-y-8">
      <section aria-labelledby="plans">
        <h2 id="plans" className="mb-3">
          Plans
        </h2>
        <PlanList jobId={jobId} currency={shop.currency} showPrices={showPrices} timeZone={shop.timeZone} />
      </section>
      {can(user.role, 'recuts:read') && (
        <section id="recuts" aria-labelledby="recuts-heading">
          <h2 id="recuts-heading" className="mb-1">
            Re-cuts
          </h2>
          <p className="mb-3 max-w-3xl text-sm text-graphite-mute">Parts that came off the saw damaged. The job is not done while one is open.</p>
          <RecutList jobId={jobId} units={shop.units} canNest={can(user.role, 'nest:run')} canCancel={can(user.role, 'recuts:cancel')} />
        </section>
      )}
      {can(user.role, 'nest:run') && (
        <section id="nest" aria-labelledby="nest-heading">
          <h2 id="nest-heading" className="mb-1">
            {nestFor === 'recuts' ? 'Nest the re-cuts' : 'Nest'}
          </h2>
          {nestFor === 'recuts' ? (
            <p className="mb-3 max-w-3xl text-sm text-graphite-mute">
              Only the open re-cuts, nothing else of the cut list, laid on offcuts first, then on sheets and boards. Release the plan like any other:
              its re-cuts are closed when it is finished. <Link href={`/jobs/${jobId}/plan#nest`}>Nest the cut list instead</Link>
            </p>
          ) : (
            <p className="mb-3 max-w-3xl text-sm text-graphite-mute">
              Lays the cut list onto the chosen stock with the saw kerf, edge trim and grain respected, using offcuts first when asked. It runs in the
              background: keep working, or stop it and keep the best plan found so far.
            </p>
          )}
          <NestPanel key={nestFor} jobId={jobId} shop={shop} showPrices={showPrices} nestFor={nestFor} />
        </section>
      )}
    </div>
  );
}

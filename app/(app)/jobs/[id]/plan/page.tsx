import type { Metadata } from 'next';
import { NestPanel } from '@/components/nesting/nest-panel';
import { PlanList } from '@/components/nesting/plan-list';
import { can } from '@/lib/auth/permissions';
import { jobSection } from '../job-section';

export const metadata: Metadata = { title: 'Plan' };

/** The job's Plan section: its plans, and (for those who may) a new Nest. */
export default async function JobPlanPage({ params }: { params: Promise<{ id: string }> }) {
  const { user, jobId, shop } = await jobSection(params, 'plans:read');
  const showPrices = can(user.role, 'prices:read');
  return (
    <div className="space-y-8">
      <section aria-labelledby="plans">
        <h2 id="plans" className="mb-3">Plans</h2>
        <PlanList jobId={jobId} currency={shop.currency} showPrices={showPrices} />
      </section>
      {can(user.role, 'nest:run') && (
        <section aria-labelledby="nest">
          <h2 id="nest" className="mb-1">Nest</h2>
          <p className="mb-3 max-w-3xl text-sm text-graphite-mute">
            Lays the cut list onto the chosen stock with the saw kerf, edge trim and grain respected, using offcuts first when asked. It runs in the
            background: keep working, or stop it and keep the best plan found so far.
          </p>
          <NestPanel jobId={jobId} shop={shop} showPrices={showPrices} />
        </section>
      )}
    </div>
  );
}

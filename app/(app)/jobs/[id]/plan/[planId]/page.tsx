import { found } from '@/server/page-data';
import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getPlan } from '@/db/queries/plan-document';
import { withoutPrices } from '@/lib/stock/without-prices';
import { getShopSettings } from '@/db/queries/shops';
import { LayoutBench } from '@/components/layout-bench/layout-bench';
import type { PlanForBench } from '@/shared/wire/plans';
import { PlanSummary } from '@/components/nesting/plan-summary';
import { ReleasePlanButton } from '@/components/stock/release-plan-button';
import { StatusBadge } from '@/components/ui/status-badge';
import { requirePageUser } from '@/server/auth/session';
import { can } from '@/lib/auth/permissions';

export const metadata: Metadata = { title: 'Plan' };

const params = z.object({ id: z.uuid(), planId: z.uuid() });

/** One plan of the job: its figures and the Layout bench (editable while it is a draft). */
export default async function PlanPage({ params: raw }: { params: Promise<{ id: string; planId: string }> }) {
  const user = await requirePageUser('plans:read');
  const parsed = params.safeParse(await raw);
  if (!parsed.success) notFound();
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [plan, shop] = await found(Promise.all([getPlan(scope, parsed.data.planId), getShopSettings(scope)]));
  const mayEdit = can(user.role, 'plans:write');
  if (plan.jobId !== parsed.data.id || (plan.status === 'draft' && !mayEdit)) notFound();
  const showPrices = can(user.role, 'prices:read');
  // What GET /api/plans/:id would answer, prices out for those who may not see them: the bench needs no second read.
  const read = { id: plan.id, status: plan.status, updatedAt: plan.updatedAt.toISOString(), request: plan.request, document: plan.document };
  const benchData: PlanForBench = showPrices ? read : withoutPrices(read);
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center gap-3">
        <Link href={`/jobs/${plan.jobId}/plan`} className="text-sm text-graphite-mute">
          ← Plans
        </Link>
        <h2 className="flex items-center gap-2">
          {plan.name} <StatusBadge tone={plan.status === 'draft' ? 'neutral' : 'accent'}>{plan.status}</StatusBadge>
          {plan.recutPlan && <StatusBadge tone="warn">Re-cuts</StatusBadge>}
        </h2>
        {plan.status !== 'draft' && (
          <Link href={`/plans/${plan.id}/saw-order`} className="btn-quiet ml-auto">
            Saw order
          </Link>
        )}
        {plan.status === 'draft' && can(user.role, 'plans:release') && (
          <div className="ml-auto">
            <ReleasePlanButton planId={plan.id} />
          </div>
        )}
      </div>
      {plan.status === 'draft' && mayEdit && (
        <p className="text-sm text-graphite-mute">A draft: change the layout below, then save it. Once released the layout is fixed.</p>
      )}
      <PlanSummary
        plan={showPrices ? plan.document : withoutPrices(plan.document)}
        units={shop.units}
        currency={shop.currency}
        showPrices={showPrices}
      />
      <LayoutBench planId={plan.id} initial={benchData} editable={mayEdit && plan.status === 'draft'} units={shop.units} />
    </div>
  );
}

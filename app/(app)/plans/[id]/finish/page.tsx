import { getJob } from '@/db/queries/jobs';
import { found } from '@/server/page-data';
import { scopeOf } from '@/db/scope';
import type { Metadata } from 'next';
import { exactLengthText } from '@/lib/cut-list/exact-length';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { getPlan } from '@/db/queries/plan-document';
import { getShopSettings } from '@/db/queries/shops';
import { FinishPlanForm, type FinishPiece } from '@/components/stock/finish-plan-form';
import { EmptyState } from '@/components/ui/empty-state';
import { PageHeader } from '@/components/ui/page-header';
import { can } from '@/lib/auth/permissions';
import { requirePageUser } from '@/server/auth/session';
import { minOffcutFor } from '@/lib/stock/finish-plan';
import { isKeepableOffcut } from '@/lib/stock/offcut-rules';
import { formatLength } from '@/lib/units/format-length';

export const metadata: Metadata = { title: 'Finish plan' };

export default async function FinishPlanPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requirePageUser('plans:finish');
  const id = z.uuid().safeParse((await params).id);
  if (!id.success) notFound();
  const db = await getDb();
  const scope = scopeOf(db, user);
  const [plan, settings] = await found(Promise.all([getPlan(scope, id.data), getShopSettings(scope)]));
  // Drafts exist only for people who may edit plans, as in the API (GET /api/plans/:id).
  if (plan.status === 'draft' && !can(user.role, 'plans:write')) notFound();
  const job = await getJob(scope, plan.jobId);
  const len = (mm: number) => formatLength(mm, settings.units);
  const min = minOffcutFor(plan.request, settings);
  const labels = new Map((plan.request?.parts ?? []).map((p) => [p.id, p.label || p.id]));

  const pieces: FinishPiece[] = plan.document.pieces.map((p, index) => ({
    index,
    title: `Piece ${index + 1} · ${p.material} ${exactLengthText(p.thickness, settings.units)} · ${len(p.length)} × ${len(p.width)}${p.kind === 'offcut' ? ' (offcut)' : ''}`,
    offcuts: (p.offcuts ?? []).map((r, i) => ({ index: i, w: r.w, h: r.h, keepable: isKeepableOffcut(r, min) })),
    parts: p.placements.map((pl) => ({
      partId: pl.partId,
      instance: pl.instance,
      label: pl.label || labels.get(pl.partId) || pl.partId,
      w: pl.w,
      h: pl.h,
    })),
  }));

  const open = plan.status === 'released' || plan.status === 'cutting';
  return (
    <>
      <Link href={`/plans/${plan.id}/saw-order`} className="text-sm text-graphite-mute">
        ← Saw order
      </Link>
      <PageHeader
        title={`Finish: ${plan.name}`}
        lead={`${job.name} · when the last cut is made, put the offcuts on the rack and record any damaged parts. The stock the plan reserved is taken off the count.`}
      />
      {open ? (
        <FinishPlanForm planId={plan.id} pieces={pieces} units={settings.units} defaultLocation="" />
      ) : (
        <EmptyState title={`This plan is ${plan.status}.`}>Only a released plan, or one being cut, can be finished.</EmptyState>
      )}
    </>
  );
}

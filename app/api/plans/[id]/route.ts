import { getPlan, getPlanAsJson } from '@/db/queries/plan-document';
import { updateDraftPlan } from '@/db/queries/plan-drafts';
import { judgePlan } from '@/lib/nesting/judge-plan';
import { withoutPrices } from '@/lib/stock/without-prices';
import { conflict, invalid, notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { can } from '@/lib/auth/permissions';
import { rebuildCuts } from '@/lib/nesting';
import { planSchema } from '@/shared/schemas/nesting';
import { planUpdateSchema } from '@/shared/schemas/plan-save';

// GET /api/plans/:id – a plan with its request and document (drafts only for those who may edit; prices only for those allowed)
export const GET = route({ permission: 'plans:read', params: idParams }, async ({ scope, user, params }) => {
  // Those who see prices get the stored JSON as it is (checked when it was written); the rest, and a document of an
  // older version, go the long way: read, migrated, checked, prices taken out.
  if (can(user.role, 'prices:read')) {
    const stored = await getPlanAsJson(scope, params.id);
    if (stored !== 'older' && stored.status === 'draft' && !can(user.role, 'plans:write')) throw notFound('That plan');
    if (stored !== 'older') return new Response(stored.json, { headers: { 'content-type': 'application/json' } });
  }
  const plan = await getPlan(scope, params.id);
  if (plan.status === 'draft' && !can(user.role, 'plans:write')) throw notFound('That plan');
  const body = {
    id: plan.id,
    jobId: plan.jobId,
    name: plan.name,
    status: plan.status,
    yieldRatio: plan.yieldRatio,
    costCents: plan.costCents,
    createdAt: plan.createdAt.toISOString(),
    updatedAt: plan.updatedAt.toISOString(),
    request: plan.request,
    document: plan.document,
  };
  return can(user.role, 'prices:read') ? body : withoutPrices(body);
});

// PUT /api/plans/:id – store an edited draft: judged with validatePlan, then its cuts rebuilt with rebuildCuts
export const PUT = route({ permission: 'plans:write', params: idParams, body: planUpdateSchema }, async ({ scope, params, body }) => {
  const saved = await getPlan(scope, params.id);
  if (saved.status !== 'draft') throw conflict(`This plan is ${saved.status}; only a draft can be edited.`);
  const request = saved.request;
  if (!request) throw conflict('This plan’s nesting request can no longer be read, so its layout cannot be checked: nest the job again.');
  const judged = judgePlan(request, body.plan);
  if (!judged.ok) throw invalid('The layout breaks the cutting rules; nothing was saved.', { plan: judged.violations.map((v) => v.message) });
  // Tree, saw order, leftovers and figures are made afresh here, whatever the bench sent.
  const plan = planSchema.parse(rebuildCuts(request, judged.plan));
  const { updatedAt } = await updateDraftPlan(scope, params.id, {
    plan,
    name: body.name,
    baseUpdatedAt: body.baseUpdatedAt,
  });
  return {
    id: params.id,
    updatedAt: updatedAt.toISOString(),
    yieldRatio: plan.totals?.yield ?? null,
    costCents: plan.totals ? Math.round(plan.totals.cost) : null,
  };
});

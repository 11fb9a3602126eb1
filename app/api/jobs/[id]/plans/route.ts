import { requireJob } from '@/db/queries/parts';
import { buildNestRequest } from '@/db/queries/nest-request';
import { createDraftPlan, listJobPlans } from '@/db/queries/plan-drafts';
import { judgePlan } from '@/lib/nesting/judge-plan';
import { withoutPrices } from '@/lib/stock/without-prices';
import { conflict, invalid } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { can } from '@/lib/auth/permissions';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { planCreateSchema } from '@/shared/schemas/plan-save';
import { requestForChoice } from '@/lib/nesting/request-for-choice';

// GET /api/jobs/:id/plans – the job's plans with status, yield and cost (drafts and prices only for those allowed)
export const GET = route({ permission: 'plans:read', params: idParams }, async ({ scope, user, params }) => {
  await requireJob(scope, params.id);
  const all = await listJobPlans(scope, params.id);
  const shown = can(user.role, 'plans:write') ? all : all.filter((p) => p.status !== 'draft');
  return can(user.role, 'prices:read') ? shown : withoutPrices(shown);
});

// POST /api/jobs/:id/plans – save a Nest's plan (of the cut list or of the open re-cuts) as a draft, judged against the request rebuilt from the database
export const POST = route({ permission: 'plans:write', params: idParams, body: planCreateSchema, status: 201 }, async ({ scope, params, body }) => {
  await requireJob(scope, params.id);
  const offered = await buildNestRequest(scope, params.id, body.settings, body.for);
  const request = nestRequestSchema.parse(requestForChoice(offered, { stockIds: body.stockIds }));
  const judged = judgePlan(request, body.plan);
  if (!judged.ok) throw invalid('The plan breaks the cutting rules; nothing was saved.', { plan: judged.violations.map((v) => v.message) });
  if (body.for === 'recuts' && !request.parts.length) throw conflict('This job has no open re-cuts to nest; nothing was saved.');
  const row = await createDraftPlan(scope, params.id, {
    name: body.name,
    request,
    plan: judged.plan,
    recutPlan: body.for === 'recuts',
  });
  return { id: row.id, updatedAt: row.updatedAt.toISOString() };
});

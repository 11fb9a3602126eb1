import { getJob } from '@/db/queries/jobs';
import { buildNestRequest } from '@/db/queries/nest-request';
import { createDraftPlan, judgePlan, listJobPlans } from '@/db/queries/plan-drafts';
import { withoutPrices } from '@/lib/stock/without-prices';
import { HttpError, notFound } from '@/lib/api/errors';
import { idParams, route } from '@/lib/api/route';
import { can } from '@/lib/auth/permissions';
import { nestRequestSchema } from '@/shared/schemas/nesting';
import { planCreateSchema } from '@/shared/schemas/plan-save';

// GET /api/jobs/:id/plans – the job's plans with status, yield and cost (drafts and prices only for those allowed)
export const GET = route({ permission: 'plans:read', params: idParams }, async ({ db, user, params }) => {
  if (!(await getJob(db, user.shopId, params.id))) throw notFound('That job');
  const all = await listJobPlans(db, user.shopId, params.id);
  const shown = can(user.role, 'plans:write') ? all : all.filter((p) => p.status !== 'draft');
  return can(user.role, 'prices:read') ? shown : withoutPrices(shown);
});

// POST /api/jobs/:id/plans – save a Nest's plan (of the cut list or of the open re-cuts) as a draft, judged against the request rebuilt from the database
export const POST = route(
  { permission: 'plans:write', params: idParams, body: planCreateSchema, status: 201 },
  async ({ db, user, params, body }) => {
    if (!(await getJob(db, user.shopId, params.id))) throw notFound('That job');
    const offered = await buildNestRequest(db, user.shopId, params.id, body.settings, body.for);
    const known = new Set(offered.stock.map((s) => s.id));
    const unknown = body.stockIds.filter((id) => !known.has(id));
    if (unknown.length) {
      throw new HttpError(422, 'Some of the chosen stock is no longer on offer; nest again.', {
        stockIds: unknown.map((id) => `"${id}" is not on offer`),
      });
    }
    const chosen = new Set(body.stockIds);
    const request = nestRequestSchema.parse({ ...offered, stock: offered.stock.filter((s) => chosen.has(s.id)) });
    const judged = judgePlan(request, body.plan);
    if (!judged.ok)
      throw new HttpError(422, 'The plan breaks the cutting rules; nothing was saved.', { plan: judged.violations.map((v) => v.message) });
    if (body.for === 'recuts' && !request.parts.length) throw new HttpError(409, 'This job has no open re-cuts to nest; nothing was saved.');
    const row = await createDraftPlan(db, {
      shopId: user.shopId,
      jobId: params.id,
      userId: user.id,
      name: body.name,
      request,
      plan: judged.plan,
      recutPlan: body.for === 'recuts',
    });
    return { id: row.id, updatedAt: row.updatedAt.toISOString() };
  },
);

import { idParams, route } from '@/lib/api/route';
import { finishPlan } from '@/db/queries/plan-lifecycle';
import { finishPlanSchema } from '@/shared/schemas/stock';

// POST /api/plans/:id/done – consume the plan's stock, put its offcuts on the rack, record yield, waste and cost
export const POST = route({ permission: 'plans:finish', params: idParams, body: finishPlanSchema }, async ({ db, user, params, body }) =>
  finishPlan(db, { shopId: user.shopId, userId: user.id, planId: params.id, body }),
);

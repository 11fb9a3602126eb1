import { idParams, route } from '@/server/api/route';
import { can } from '@/lib/auth/permissions';
import { finishPlan } from '@/db/queries/plan-lifecycle';
import { withoutPrices } from '@/lib/stock/without-prices';
import { finishPlanSchema } from '@/shared/schemas/stock';

// POST /api/plans/:id/done – consume the plan's stock, put its offcuts on the rack, record yield, waste and cost
export const POST = route({ permission: 'plans:finish', params: idParams, body: finishPlanSchema }, async ({ scope, user, params, body }) => {
  const result = await finishPlan(scope, params.id, body);
  // The cost is recorded for the owner's ledger; a cutter's answer leaves it out.
  return can(user.role, 'prices:read') ? result : withoutPrices({ ...result });
});

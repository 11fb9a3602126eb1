import { idParams, route } from '@/server/api/route';
import { cancelPlan } from '@/db/queries/plan-lifecycle';

// POST /api/plans/:id/cancel – close the plan and give back every reservation it holds
export const POST = route({ permission: 'plans:release', params: idParams }, async ({ db, user, params }) =>
  cancelPlan({ db, shopId: user.shopId, userId: user.id }, params.id),
);

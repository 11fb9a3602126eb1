import { idParams, route } from '@/server/api/route';
import { cancelPlan } from '@/db/queries/plan-lifecycle';

// POST /api/plans/:id/cancel – close the plan and give back every reservation it holds
export const POST = route({ permission: 'plans:release', params: idParams }, async ({ scope, params }) => cancelPlan(scope, params.id));

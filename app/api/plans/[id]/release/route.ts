import { idParams, route } from '@/server/api/route';
import { releasePlan } from '@/db/queries/plan-lifecycle';

// POST /api/plans/:id/release – reserve exactly the stock the plan uses, all or nothing (409 with the pieces that are gone)
export const POST = route({ permission: 'plans:release', params: idParams }, async ({ scope, params }) => releasePlan(scope, params.id));

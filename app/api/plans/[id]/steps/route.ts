import { getStepTicks, tickStep, untickStep } from '@/db/queries/saw-steps';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { can } from '@/lib/auth/permissions';
import { stepRefSchema } from '@/lib/saw-order/step-ref';

// GET /api/plans/:id/steps – the plan's status and its ticked saw-order steps (who and when)
export const GET = route({ permission: 'plans:read', params: idParams }, async ({ scope, user, params }) => {
  const ticks = await getStepTicks(scope, params.id);
  // Drafts exist only for people who may edit plans, as everywhere else.
  if (ticks.status === 'draft' && !can(user.role, 'plans:write')) throw notFound('That plan');
  return ticks;
});

// POST /api/plans/:id/steps – tick a step done (idempotent; the first tick moves a released plan to cutting)
export const POST = route({ permission: 'sawsteps:tick', params: idParams, body: stepRefSchema }, async ({ scope, params, body }) => {
  return tickStep(scope, params.id, body);
});

// DELETE /api/plans/:id/steps – take a tick back (body: which piece and step)
export const DELETE = route({ permission: 'sawsteps:tick', params: idParams, body: stepRefSchema }, async ({ scope, params, body }) => {
  return untickStep(scope, params.id, body);
});

import { idParams, route } from '@/server/api/route';
import { notFound } from '@/server/api/errors';
import { getTakeoff } from '@/db/queries/takeoff';

// GET /api/jobs/:id/takeoff – the material check for the job's latest plan: pull, buy, board feet or area, cost with waste, covered now
export const GET = route({ permission: 'prices:read', params: idParams }, async ({ scope, params }) => {
  const takeoff = await getTakeoff(scope, params.id);
  if (!takeoff) throw notFound('A plan for that job');
  return takeoff;
});

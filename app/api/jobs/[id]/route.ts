import { deleteJob, getJob, updateJob } from '@/db/queries/jobs';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { jobPatchSchema } from '@/shared/schemas/job';

// GET /api/jobs/:id – one job
export const GET = route({ permission: 'jobs:read', params: idParams }, async ({ db, user, params }) => {
  return (await getJob(db, user.shopId, params.id)) ?? Promise.reject(notFound('That job'));
});

// PATCH /api/jobs/:id – change a job's name, customer, due date or notes, or its status by hand (403 for a status the role may not set)
export const PATCH = route({ permission: 'jobs:write', params: idParams, body: jobPatchSchema }, async ({ db, user, params, body }) => {
  return (await updateJob(db, user.shopId, user, params.id, body)) ?? Promise.reject(notFound('That job'));
});

// DELETE /api/jobs/:id – delete a job with its cut list and draft plans; 409 for a job with history (archive it instead)
export const DELETE = route({ permission: 'jobs:write', params: idParams }, async ({ db, user, params }) => {
  if (!(await deleteJob(db, user.shopId, user.id, params.id))) throw notFound('That job');
  return { ok: true };
});

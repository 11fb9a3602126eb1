import { deleteJob, getJob, updateJob } from '@/db/queries/jobs';
import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { jobPatchSchema } from '@/shared/schemas/job';

// GET /api/jobs/:id – one job
export const GET = route({ permission: 'jobs:read', params: idParams }, async ({ scope, params }) => {
  return (await getJob(scope, params.id)) ?? Promise.reject(notFound('That job'));
});

// PATCH /api/jobs/:id – change a job's name, customer, due date or notes, or its status by hand (403 for a status the role may not set)
export const PATCH = route({ permission: 'jobs:write', params: idParams, body: jobPatchSchema }, async ({ scope, user, params, body }) => {
  return (await updateJob(scope, user, params.id, body)) ?? Promise.reject(notFound('That job'));
});

// DELETE /api/jobs/:id – delete a job with its cut list and draft plans; 409 for a job with history (archive it instead)
export const DELETE = route({ permission: 'jobs:write', params: idParams }, async ({ scope, params }) => {
  if (!(await deleteJob(scope, params.id))) throw notFound('That job');
  return { ok: true };
});

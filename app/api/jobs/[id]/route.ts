import { deleteJob, getJob, updateJob } from '@/db/queries/jobs';
import { idParams, route } from '@/server/api/route';
import { jobPatchSchema } from '@/shared/schemas/job';

// GET /api/jobs/:id – one job
export const GET = route({ permission: 'jobs:read', params: idParams }, async ({ scope, params }) => {
  return getJob(scope, params.id);
});

// PATCH /api/jobs/:id – change a job's name, customer, due date or notes, or its status by hand (403 for a status the role may not set)
export const PATCH = route({ permission: 'jobs:write', params: idParams, body: jobPatchSchema }, async ({ scope, user, params, body }) => {
  return updateJob(scope, user, params.id, body);
});

// DELETE /api/jobs/:id – delete a job with its cut list and draft plans; 409 for a job with history (archive it instead)
export const DELETE = route({ permission: 'jobs:write', params: idParams }, async ({ scope, params }) => {
  await deleteJob(scope, params.id);
  return { ok: true };
});

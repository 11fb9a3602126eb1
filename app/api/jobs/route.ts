import { createJob, listJobs } from '@/db/queries/jobs';
import { route } from '@/lib/api/route';
import { jobInputSchema } from '@/shared/schemas/job';

// GET /api/jobs – the shop's jobs with part counts and materials
export const GET = route({ permission: 'jobs:read' }, async ({ db, user }) => listJobs(db, user.shopId));

// POST /api/jobs – create a job
export const POST = route({ permission: 'jobs:write', body: jobInputSchema, status: 201 }, async ({ db, user, body }) =>
  createJob(db, user.shopId, user.id, body),
);

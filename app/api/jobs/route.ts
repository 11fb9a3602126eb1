import { createJob, listJobsPage } from '@/db/queries/jobs';
import { route } from '@/server/api/route';
import { jobInputSchema } from '@/shared/schemas/job';
import { jobListQuerySchema } from '@/shared/schemas/job-list';

// GET /api/jobs – one page of the shop's jobs (page, size, sort, q, status, customer) with part counts and materials
export const GET = route({ permission: 'jobs:read', query: jobListQuerySchema }, async ({ scope, query }) => listJobsPage(scope, query));

// POST /api/jobs – create a job
export const POST = route({ permission: 'jobs:write', body: jobInputSchema, status: 201 }, async ({ scope, body }) => createJob(scope, body));

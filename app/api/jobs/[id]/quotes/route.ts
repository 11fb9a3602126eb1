import { requireJob } from '@/db/queries/parts';
import { createQuote, listJobQuotes } from '@/db/queries/quotes';
import { idParams, route } from '@/server/api/route';
import { newQuoteSchema } from '@/shared/schemas/quote';

// GET /api/jobs/:id/quotes – every revision of the job's quotes, with totals, cost and margin (estimator's view)
export const GET = route({ permission: 'quotes:read', params: idParams }, async ({ scope, params }) => {
  await requireJob(scope, params.id);
  return listJobQuotes(scope, params.id);
});

// POST /api/jobs/:id/quotes – a new quote (next number, rev A) built from the job and one of its plans
export const POST = route({ permission: 'quotes:write', params: idParams, body: newQuoteSchema, status: 201 }, async ({ scope, params, body }) =>
  createQuote(scope, params.id, body.planId),
);

import { getRevision, updateRevision } from '@/db/queries/quotes';
import { idParams, route } from '@/server/api/route';
import { quoteRevisionPatchSchema } from '@/shared/schemas/quote';

// GET /api/quotes/:id – one quote revision with its lines and totals (estimator's view: cost, margin, hours)
export const GET = route({ permission: 'quotes:read', params: idParams }, async ({ scope, params }) => {
  return getRevision(scope, params.id);
});

// PATCH /api/quotes/:id – change a draft revision's lines, markups, discount, tax, deposit, validity or terms (409 once sent)
export const PATCH = route({ permission: 'quotes:write', params: idParams, body: quoteRevisionPatchSchema }, async ({ scope, params, body }) =>
  updateRevision(scope, params.id, body),
);

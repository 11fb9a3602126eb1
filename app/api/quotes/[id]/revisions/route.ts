import { getRevision, newRevision } from '@/db/queries/quotes';
import { idParams, route } from '@/server/api/route';

// POST /api/quotes/:id/revisions – a new draft revision of this revision's quote, copied from its latest (409 while that is a draft)
export const POST = route({ permission: 'quotes:write', params: idParams, status: 201 }, async ({ scope, params }) => {
  const rev = await getRevision(scope, params.id);
  return newRevision(scope, rev.quoteId);
});

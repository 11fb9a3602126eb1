import { sendRevision } from '@/db/queries/quotes';
import { idParams, route } from '@/lib/api/route';

// POST /api/quotes/:id/send – mark the latest revision sent (replacing an earlier sent one); the job becomes quoted
export const POST = route({ permission: 'quotes:write', params: idParams }, async ({ db, user, params }) => sendRevision(db, user.shopId, user.id, params.id));

import { cancelRecut } from '@/db/queries/recuts';
import { idParams, route } from '@/server/api/route';
import { cancelRecutSchema } from '@/shared/schemas/recut';

// POST /api/recuts/:id/cancel – take an open re-cut off its job's list, with the reason (409 for one in a released plan or already closed)
export const POST = route({ permission: 'recuts:cancel', params: idParams, body: cancelRecutSchema }, async ({ scope, params, body }) =>
  cancelRecut(scope, params.id, body.reason),
);

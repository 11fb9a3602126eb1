import { notFound } from '@/server/api/errors';
import { idParams, route } from '@/server/api/route';
import { retryFailedMail } from '@/server/mail/outbox';
import { wakeMailSender } from '@/server/mail/service';

// POST /api/outbox/:id/retry – put a failed message back in the queue (same Message-ID)
export const POST = route({ permission: 'mail:manage', params: idParams }, async ({ db, user, params }) => {
  if (!(await retryFailedMail(db, user.shopId, params.id))) throw notFound('That failed message');
  wakeMailSender();
  return { ok: true };
});

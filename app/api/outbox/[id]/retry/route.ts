import { idParams, route } from '@/server/api/route';
import { retryFailedMail } from '@/server/mail/outbox';
import { wakeMailSender } from '@/server/mail/service';

// POST /api/outbox/:id/retry – put a failed message back in the queue (same Message-ID)
export const POST = route({ permission: 'mail:manage', params: idParams }, async ({ scope, params }) => {
  await retryFailedMail(scope, params.id);
  wakeMailSender();
  return { ok: true };
});

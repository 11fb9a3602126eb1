import { requestPasswordReset } from '@/db/queries/user-links';
import { ANYONE, route } from '@/server/api/route';
import { throttlePublicRequest } from '@/server/api/throttle';
import { wakeMailSender } from '@/server/mail/service';
import { passwordResetRequestSchema } from '@/shared/schemas/user';

// POST /api/password-resets – public: mail a reset link to this address if it has an account (the answer is the same either way)
export const POST = route({ permission: ANYONE, body: passwordResetRequestSchema, status: 202 }, async ({ req, db, body }) => {
  await throttlePublicRequest(req, 'password-reset-request', body.email);
  await requestPasswordReset(db, body.email);
  wakeMailSender();
  return { ok: true, message: 'If that address belongs to an active account, a link to choose a new password is on its way. It works for one hour.' };
});

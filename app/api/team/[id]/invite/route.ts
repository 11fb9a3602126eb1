import { resendInvite } from '@/db/queries/team';
import { idParams, route } from '@/server/api/route';
import { wakeMailSender } from '@/server/mail/service';

// POST /api/team/:id/invite – mail a fresh invite link to someone who has not chosen a password yet
export const POST = route({ permission: 'team:manage', params: idParams }, async ({ db, user, params }) => {
  const member = await resendInvite(db, user.shopId, user.id, params.id);
  wakeMailSender();
  return member;
});

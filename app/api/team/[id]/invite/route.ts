import { resendInvite } from '@/db/queries/team';
import { idParams, route } from '@/server/api/route';
import { wakeMailSender } from '@/server/mail/service';

// POST /api/team/:id/invite – mail a fresh invite link to someone who has not chosen a password yet
export const POST = route({ permission: 'team:manage', params: idParams }, async ({ scope, params }) => {
  const member = await resendInvite(scope, params.id);
  wakeMailSender();
  return member;
});

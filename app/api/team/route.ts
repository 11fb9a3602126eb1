import { addTeamMember, teamOf } from '@/db/queries/team';
import { route } from '@/server/api/route';
import { wakeMailSender } from '@/server/mail/service';
import { teamMemberInputSchema } from '@/shared/schemas/user';

// GET /api/team – everyone in the shop with role and status
export const GET = route({ permission: 'team:manage' }, async ({ scope }) => teamOf(scope));

// POST /api/team – add a person with a role: invited by mail to choose a password, or given a first password
export const POST = route({ permission: 'team:manage', body: teamMemberInputSchema, status: 201 }, async ({ scope, body }) => {
  const member = await addTeamMember(scope, body);
  if (member.invited) wakeMailSender();
  return member;
});

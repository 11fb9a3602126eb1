import { updateTeamMember } from '@/db/queries/team';
import { idParams, route } from '@/lib/api/route';
import { teamMemberPatchSchema } from '@/shared/schemas/user';

// PATCH /api/team/:id – change a person's role, name, password, or deactivate/reactivate them
export const PATCH = route({ permission: 'team:manage', params: idParams, body: teamMemberPatchSchema }, async ({ db, user, params, body }) =>
  updateTeamMember(db, user.shopId, user.id, params.id, body),
);

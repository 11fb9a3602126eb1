import { updateTeamMember } from '@/db/queries/team';
import { idParams, route } from '@/server/api/route';
import { teamMemberPatchSchema } from '@/shared/schemas/user';

// PATCH /api/team/:id – change a person's role, name, password, or deactivate/reactivate them
export const PATCH = route({ permission: 'team:manage', params: idParams, body: teamMemberPatchSchema }, async ({ scope, params, body }) =>
  updateTeamMember(scope, params.id, body),
);

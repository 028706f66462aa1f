// PATCH/DELETE /api/teams/[teamId]/members/[userId]: a lead changes a member's role or removes them
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { AppError } from '@/lib/api/errors';
import { ChangeRoleInput } from '@/lib/schemas/team';
import { changeMemberRole } from '@/lib/services/teams/change-member-role';
import { removeMember } from '@/lib/services/teams/remove-member';

export const runtime = 'nodejs';

function memberId(params: Record<string, string>): number {
  const id = Number(params.userId);
  if (!Number.isInteger(id) || id <= 0) throw new AppError('NOT_FOUND', 'No such member in this team.');
  return id;
}

export const PATCH = withRoute(
  { access: 'team', teamFrom: 'path', permission: 'team.manage', body: ChangeRoleInput },
  async ({ team, user, params, body }) => changeMemberRole({ teamId: team.id, actorId: user.id, userId: memberId(params), role: body.role }),
);

export const DELETE = withRoute({ access: 'team', teamFrom: 'path', permission: 'team.manage' }, async ({ team, user, params }) =>
  removeMember({ teamId: team.id, actorId: user.id, userId: memberId(params) }),
);

export const { GET, POST, PUT, OPTIONS } = refuseOtherMethods({ PATCH, DELETE });

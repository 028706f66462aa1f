// DELETE /api/teams/[teamId]/invitations/[invitationId]: a lead withdraws a pending invitation
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { revokeInvitation } from '@/lib/services/invitations/revoke-invitation';

export const runtime = 'nodejs';

export const DELETE = withRoute({ access: 'team', teamFrom: 'path', permission: 'team.manage' }, async ({ team, user, params }) =>
  revokeInvitation({ teamId: team.id, actorId: user.id, invitationId: Number(params.invitationId) || 0 }),
);

export const { GET, POST, PUT, PATCH, OPTIONS } = refuseOtherMethods({ DELETE });

// GET/POST /api/teams/[teamId]/invitations: a lead lists invitations or invites an address with a role
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { InviteInput } from '@/lib/schemas/team';
import { enforceLimits, inviteLimiter } from '@/lib/security/rate-limit';
import { createInvitation } from '@/lib/services/invitations/create-invitation';
import { listInvitations } from '@/lib/services/invitations/list-invitations';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: 'path', permission: 'team.manage' }, async ({ team }) => ({
  invitations: await listInvitations({ teamId: team.id }),
}));

export const POST = withRoute(
  { access: 'team', teamFrom: 'path', permission: 'team.manage', body: InviteInput },
  async ({ team, user, body }) => {
    await enforceLimits([[inviteLimiter(), `team:${team.id}`]], (wait) => `Too many invitations this hour. Wait ${wait} s.`);
    const result = await createInvitation({ teamId: team.id, inviter: user, email: body.email, role: body.role });
    return Response.json(result, { status: 201 });
  },
);

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });

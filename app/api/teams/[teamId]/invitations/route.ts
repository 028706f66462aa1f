// GET/POST /api/teams/[teamId]/invitations: a lead lists invitations or invites an address with a role
import { withRoute } from '@/lib/api/with-route';
import { AppError } from '@/lib/api/errors';
import { InviteInput } from '@/lib/schemas/team';
import { inviteLimiter } from '@/lib/security/rate-limit';
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
    const key = `team:${team.id}`;
    const verdict = inviteLimiter().check(key);
    if (!verdict.allowed) {
      throw new AppError('RATE_LIMITED', `Too many invitations this hour. Wait ${verdict.retryAfterSeconds} s.`, {
        headers: { 'Retry-After': String(verdict.retryAfterSeconds) },
      });
    }
    inviteLimiter().hit(key);
    const result = await createInvitation({ teamId: team.id, inviter: user, email: body.email, role: body.role });
    return Response.json(result, { status: 201 });
  },
);

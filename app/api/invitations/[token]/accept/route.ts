// POST /api/invitations/[token]/accept: join the team, signing up first when the address has no account
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { AcceptInvitationInput } from '@/lib/schemas/auth';
import { acceptInvitation } from '@/lib/services/invitations/accept-invitation';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'public', body: AcceptInvitationInput }, async ({ params, user, body }) =>
  acceptInvitation({ token: params.token ?? '', sessionUser: user, input: body }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });

// PUT /api/me/active-team: switch the team the user works in
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { ActiveTeamInput } from '@/lib/schemas/preferences';
import { setActiveTeam } from '@/lib/services/users/set-active-team';

export const runtime = 'nodejs';

export const PUT = withRoute({ access: 'user', body: ActiveTeamInput }, async ({ user, body }) =>
  setActiveTeam({ userId: user.id, teamId: body.teamId }),
);

export const { GET, POST, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ PUT });

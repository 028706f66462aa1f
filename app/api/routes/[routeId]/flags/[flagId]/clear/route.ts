// POST /api/routes/[routeId]/flags/[flagId]/clear: clear a flag with a comment on its step, in one transaction
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { ClearFlagInput } from '@/lib/schemas/flag';
import { clearFlag } from '@/lib/services/flags/clear-flag';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.flag', body: ClearFlagInput }, async ({ team, user, params, body }) =>
  clearFlag({ teamId: team.id, routeId: Number(params.routeId), flagId: Number(params.flagId), userId: user.id, input: body }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });

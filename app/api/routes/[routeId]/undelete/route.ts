// POST /api/routes/[routeId]/undelete: bring back a route deleted within the last 30 days (leads only)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { undeleteRoute } from '@/lib/services/routes/delete-route';
import { teamOfRouteIncludingDeleted } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'team', teamFrom: teamOfRouteIncludingDeleted, permission: 'route.decide' }, async ({ team, user, params }) =>
  undeleteRoute({ teamId: team.id, userId: user.id, routeId: Number(params.routeId) }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });

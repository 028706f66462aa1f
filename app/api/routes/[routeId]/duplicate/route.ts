// POST /api/routes/[routeId]/duplicate: copy a route as an alternative that remembers its origin
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { DuplicateRouteInput } from '@/lib/schemas/route';
import { duplicateRoute } from '@/lib/services/routes/duplicate-route';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';

export const POST = withRoute(
  { access: 'team', teamFrom: teamOfRoute, permission: 'route.edit', body: DuplicateRouteInput },
  async ({ team, user, params, body }) =>
    Response.json(await duplicateRoute({ teamId: team.id, userId: user.id, routeId: Number(params.routeId), name: body.name }), { status: 201 }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });

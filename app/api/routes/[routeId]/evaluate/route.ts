// POST /api/routes/[routeId]/evaluate: evaluate every step and build the ladder (the saved route, or an unsaved draft in the body)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { RouteDraftBody } from '@/lib/schemas/route';
import { evaluateRouteRequest } from '@/lib/services/routes/evaluate-route-request';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';

export const POST = withRoute(
  { access: 'team', teamFrom: teamOfRoute, permission: 'route.read', body: RouteDraftBody, maxBodyBytes: 2 * 1024 * 1024 },
  async ({ team, params, body }) => evaluateRouteRequest({ teamId: team.id, routeId: Number(params.routeId), draft: body }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });

// GET /api/routes/[routeId]/alternatives: the route it was duplicated from and the routes duplicated from it
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { listAlternatives } from '@/lib/services/routes/list-alternatives';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read' }, async ({ team, params }) =>
  listAlternatives({ teamId: team.id, routeId: Number(params.routeId) }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });

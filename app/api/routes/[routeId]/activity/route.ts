// GET /api/routes/[routeId]/activity: one newest-first feed of the route's revisions, moves, comments and flags (keyset pages)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { ListActivityQuery } from '@/lib/schemas/activity';
import { listActivity } from '@/lib/services/activity/list-activity';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read', query: ListActivityQuery }, async ({ team, params, query }) =>
  listActivity({ teamId: team.id, routeId: Number(params.routeId), query }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });

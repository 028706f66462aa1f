// GET/POST /api/routes/[routeId]/flags: the route's open flags per step, or flag a step as weak
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { CreateFlagInput, ListFlagsQuery } from '@/lib/schemas/flag';
import { createFlag } from '@/lib/services/flags/create-flag';
import { listFlags } from '@/lib/services/flags/list-flags';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read', query: ListFlagsQuery }, async ({ team, params, query }) =>
  listFlags({ teamId: team.id, routeId: Number(params.routeId), query }),
);

export const POST = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.flag', body: CreateFlagInput }, async ({ team, user, params, body }) =>
  Response.json(await createFlag({ teamId: team.id, routeId: Number(params.routeId), userId: user.id, input: body }), { status: 201 }),
);

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });

// GET/POST /api/routes: the team's routes (search, sort, pages) and creating a new one
import { withRoute } from '@/lib/api/with-route';
import { CreateRouteInput, ListRoutesQuery } from '@/lib/schemas/route';
import { createRoute } from '@/lib/services/routes/create-route';
import { listRoutes } from '@/lib/services/routes/list-routes';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'route.read', query: ListRoutesQuery }, async ({ team, query }) =>
  listRoutes({ teamId: team.id, query }),
);

export const POST = withRoute({ access: 'team', permission: 'route.edit', body: CreateRouteInput }, async ({ team, user, body }) =>
  Response.json(await createRoute({ teamId: team.id, userId: user.id, input: body }), { status: 201 }),
);

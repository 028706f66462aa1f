// GET/POST /api/routes: the team's routes (search, sort, pages; ?deleted=1 the recently deleted, leads only) and creating a new one
import { AppError } from '@/lib/api/errors';
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { can } from '@/lib/auth/permissions';
import { CreateRouteInput, ListRoutesQuery } from '@/lib/schemas/route';
import { createRoute } from '@/lib/services/routes/create-route';
import { listDeletedRoutes } from '@/lib/services/routes/list-deleted-routes';
import { listRoutes } from '@/lib/services/routes/list-routes';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'route.read', query: ListRoutesQuery }, async ({ team, query }) => {
  if (query.deleted !== '1') return listRoutes({ teamId: team.id, query });
  if (!can(team.role, 'route.decide')) throw new AppError('FORBIDDEN', 'Only a group lead can see deleted routes.');
  return listDeletedRoutes({ teamId: team.id, query });
});

export const POST = withRoute({ access: 'team', permission: 'route.edit', body: CreateRouteInput }, async ({ team, user, body }) =>
  Response.json(await createRoute({ teamId: team.id, userId: user.id, input: body }), { status: 201 }),
);

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });

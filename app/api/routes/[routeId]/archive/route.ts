// POST /api/routes/[routeId]/archive: archive or unarchive a route
import { z } from 'zod';
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { teamOfRoute } from '@/lib/services/routes/route-team';
import { setRouteArchived } from '@/lib/services/routes/set-route-archived';

export const runtime = 'nodejs';

const ArchiveInput = z.strictObject({ archived: z.boolean() });

export const POST = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.edit', body: ArchiveInput }, async ({ team, user, params, body }) =>
  setRouteArchived({ teamId: team.id, userId: user.id, routeId: Number(params.routeId), archived: body.archived }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });

// GET /api/routes/[routeId]/revisions: the route's revisions, newest first, a page at a time
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { ListRevisionsQuery } from '@/lib/schemas/revision';
import { listRevisions } from '@/lib/services/revisions/list-revisions';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read', query: ListRevisionsQuery }, async ({ team, params, query }) =>
  listRevisions({ teamId: team.id, routeId: Number(params.routeId), query }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });

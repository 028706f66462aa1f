// GET /api/routes/[routeId]/revisions/[revisionId]: one revision with its whole snapshot
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { getRevision } from '@/lib/services/revisions/get-revision';
import { teamOfRoute } from '@/lib/services/routes/route-team';
import { positiveId } from '@/lib/services/revisions/path-id';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read' }, async ({ team, params }) =>
  getRevision({ teamId: team.id, routeId: Number(params.routeId), revisionId: positiveId(params.revisionId) }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });

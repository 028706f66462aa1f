// GET /api/routes/[routeId]/revisions/compare?from=ID&to=ID: what changed between two revisions, step by step, with ΔG
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { CompareRevisionsQuery } from '@/lib/schemas/revision';
import { compareRevisions } from '@/lib/services/revisions/compare-revisions';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read', query: CompareRevisionsQuery }, async ({ team, params, query }) =>
  compareRevisions({ teamId: team.id, routeId: Number(params.routeId), fromId: query.from, toId: query.to }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });

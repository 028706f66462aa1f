// GET /api/decisions/[decisionId]: one decision of the team with the comparison snapshot it was made on
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { teamOfDecision } from '@/lib/services/decisions/decision-team';
import { getDecision } from '@/lib/services/decisions/list-decisions';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfDecision, permission: 'route.read' }, async ({ team, params }) =>
  getDecision({ teamId: team.id, decisionId: Number(params.decisionId) }),
);

export const { POST, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET });

// GET/POST /api/decisions: the team's decision log (newest first, paged), and recording a lead's choice between compared routes
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { DecisionInput, ListDecisionsQuery } from '@/lib/schemas/decision';
import { listDecisions } from '@/lib/services/decisions/list-decisions';
import { recordDecision } from '@/lib/services/decisions/record-decision';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', permission: 'route.read', query: ListDecisionsQuery }, async ({ team, query }) =>
  listDecisions({ teamId: team.id, query }),
);

// Decisions are never edited or deleted, so there is no PUT or DELETE: a newer decision supersedes.
export const POST = withRoute({ access: 'team', permission: 'route.decide', body: DecisionInput }, async ({ team, user, body }) =>
  Response.json(await recordDecision({ teamId: team.id, userId: user.id, role: team.role, input: body }), { status: 201 }),
);

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });

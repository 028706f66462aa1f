// GET/POST /api/routes/[routeId]/transitions: the route's review history, and moving it to another review status (then notifying)
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { ListTransitionsQuery, TransitionInput } from '@/lib/schemas/workflow';
import { teamOfRoute } from '@/lib/services/routes/route-team';
import { listTransitions } from '@/lib/services/workflow/list-transitions';
import { notifyTransition } from '@/lib/services/workflow/notify-transition';
import { transitionRoute } from '@/lib/services/workflow/transition-route';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read', query: ListTransitionsQuery }, async ({ team, params, query }) =>
  listTransitions({ teamId: team.id, routeId: Number(params.routeId), query }),
);

// Who may make which move is the workflow table's call, so the gate here is only membership.
// Notices go out only after the move has committed; a failed one never undoes it.
export const POST = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read', body: TransitionInput }, async ({ team, user, params, body }) => {
  const outcome = await transitionRoute({ teamId: team.id, userId: user.id, role: team.role, routeId: Number(params.routeId), input: body });
  await notifyTransition(outcome);
  return outcome;
});

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });

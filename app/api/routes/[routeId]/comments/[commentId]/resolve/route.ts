// POST /api/routes/[routeId]/comments/[commentId]/resolve: resolve ({ resolved: true }) or reopen a thread by its first comment
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { ResolveThreadInput } from '@/lib/schemas/comment';
import { resolveThread } from '@/lib/services/comments/resolve-thread';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';

export const POST = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.comment', body: ResolveThreadInput }, async ({ team, user, params, body }) =>
  resolveThread({ teamId: team.id, routeId: Number(params.routeId), commentId: Number(params.commentId), userId: user.id, resolved: body.resolved }),
);

export const { GET, PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ POST });

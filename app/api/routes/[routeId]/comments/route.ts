// GET/POST /api/routes/[routeId]/comments: the route's comment threads with unresolved counts per step, or a new comment or reply
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { CreateCommentInput, ListCommentsQuery } from '@/lib/schemas/comment';
import { createComment } from '@/lib/services/comments/create-comment';
import { listComments } from '@/lib/services/comments/list-comments';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.read', query: ListCommentsQuery }, async ({ team, params, query }) =>
  listComments({ teamId: team.id, routeId: Number(params.routeId), query }),
);

export const POST = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.comment', body: CreateCommentInput }, async ({ team, user, params, body }) =>
  Response.json(await createComment({ teamId: team.id, routeId: Number(params.routeId), userId: user.id, input: body }), { status: 201 }),
);

export const { PUT, PATCH, DELETE, OPTIONS } = refuseOtherMethods({ GET, POST });

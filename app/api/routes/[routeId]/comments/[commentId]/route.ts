// PATCH/DELETE /api/routes/[routeId]/comments/[commentId]: edit or delete one's own comment
import { refuseOtherMethods } from '@/lib/api/method-not-allowed';
import { withRoute } from '@/lib/api/with-route';
import { EditCommentInput } from '@/lib/schemas/comment';
import { deleteComment } from '@/lib/services/comments/delete-comment';
import { editComment } from '@/lib/services/comments/edit-comment';
import { teamOfRoute } from '@/lib/services/routes/route-team';

export const runtime = 'nodejs';

export const PATCH = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.comment', body: EditCommentInput }, async ({ team, user, params, body }) =>
  editComment({ teamId: team.id, routeId: Number(params.routeId), commentId: Number(params.commentId), userId: user.id, input: body }),
);

export const DELETE = withRoute({ access: 'team', teamFrom: teamOfRoute, permission: 'route.comment' }, async ({ team, user, params }) =>
  deleteComment({ teamId: team.id, routeId: Number(params.routeId), commentId: Number(params.commentId), userId: user.id }),
);

export const { GET, POST, PUT, OPTIONS } = refuseOtherMethods({ PATCH, DELETE });

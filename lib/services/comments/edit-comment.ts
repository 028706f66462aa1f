import 'server-only';
import { getDb } from '../../../db';
import type { CommentDto, EditCommentInput } from '../../schemas/comment';
import { recordEvent } from '../audit/record-event';
import { notifyNewComment } from '../notifications/notify-comment';
import { deliverNotificationMails } from '../notifications/record-notifications';
import { findOwnComment, loadRouteContext, teamMemberEmails } from './comment-context';
import { commentDto } from './create-comment';
import { resolveMentions } from './mentions';

// The comment keeps the version it was written on; only members newly mentioned by the edit are notified.
export async function editComment({ teamId, routeId, commentId, userId, input }: { teamId: number; routeId: number; commentId: number; userId: number; input: EditCommentInput }): Promise<CommentDto> {
  const { sequelize } = getDb();
  const { comment, ctx, recorded } = await sequelize.transaction(async (transaction) => {
    const ctx = await loadRouteContext({ teamId, routeId, transaction });
    const comment = await findOwnComment({ teamId, routeId, commentId, userId, transaction });
    const before = new Set(comment.mentions.map((m) => m.userId));
    const mentions = resolveMentions(input.body, await teamMemberEmails(teamId, transaction));
    await comment.update({ body: input.body, mentions, editedAt: new Date() }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'comment.edited', targetType: 'comment', targetId: comment.id }, transaction);
    const newlyMentioned = mentions.map((m) => m.userId).filter((id) => !before.has(id));
    const recorded = await notifyNewComment({ comment, route: ctx.route, actorId: userId, mentionIds: newlyMentioned, includeOwner: false, transaction });
    return { comment, ctx, recorded };
  });
  await deliverNotificationMails(recorded.mails);
  return commentDto(comment, ctx);
}

import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import type { Comment } from '../../../db/models/comment';
import { AppError } from '../../api/errors';
import type { CommentDto, CreateCommentInput } from '../../schemas/comment';
import { recordEvent } from '../audit/record-event';
import { deliverNotificationMails, type RecordedNotifications } from '../notifications/record-notifications';
import { notifyNewComment } from '../notifications/notify-comment';
import { findComment, loadRouteContext, teamMemberEmails, userNames, type RouteContext } from './comment-context';
import { namedUserIds, toCommentDto } from './comment-dto';
import { resolveMentions } from './mentions';

export interface InsertedComment {
  comment: Comment;
  ctx: RouteContext;
  recorded: RecordedNotifications;
}

// The thread a new comment joins: a reply takes its root's step; a root names a step of the route, or none.
async function placeOf({ teamId, routeId, input, ctx, allowMissingStep, transaction }: { teamId: number; routeId: number; input: CreateCommentInput; ctx: RouteContext; allowMissingStep: boolean; transaction: Transaction }) {
  if (input.parentId) {
    const parent = await findComment({ teamId, routeId, commentId: input.parentId, transaction });
    if (parent.parentId !== null) throw new AppError('VALIDATION', 'Reply to the first comment of the thread.', { fields: { parentId: 'Replies go under the first comment of a thread.' } });
    if (input.stepKey && input.stepKey !== parent.stepKey) throw new AppError('VALIDATION', 'A reply stays on its thread’s step.', { fields: { stepKey: 'A reply stays on its thread’s step.' } });
    return { parentId: parent.id, stepKey: parent.stepKey };
  }
  const stepKey = input.stepKey ?? null;
  if (stepKey && !allowMissingStep && !ctx.fingerprints.has(stepKey)) throw new AppError('VALIDATION', `This route has no step "${stepKey}".`, { fields: { stepKey: 'No such step in this route.' } });
  return { parentId: null, stepKey };
}

/**
 * Writes a comment and its notifications inside the caller's transaction; mails are left to send after
 * commit. `allowMissingStep` lets a flag's clearing comment sit on a step removed since it was flagged.
 */
export async function insertComment({
  teamId,
  routeId,
  userId,
  input,
  allowMissingStep = false,
  transaction,
}: {
  teamId: number;
  routeId: number;
  userId: number;
  input: CreateCommentInput;
  allowMissingStep?: boolean;
  transaction: Transaction;
}): Promise<InsertedComment> {
  const ctx = await loadRouteContext({ teamId, routeId, transaction });
  const place = await placeOf({ teamId, routeId, input, ctx, allowMissingStep, transaction });
  const mentions = resolveMentions(input.body, await teamMemberEmails(teamId, transaction));
  const comment = await getDb().models.Comment.create(
    {
      teamId,
      routeId,
      stepKey: place.stepKey,
      parentId: place.parentId,
      authorId: userId,
      body: input.body,
      mentions,
      routeVersion: ctx.route.version,
      stepFingerprint: place.stepKey ? (ctx.fingerprints.get(place.stepKey) ?? null) : null,
    },
    { transaction },
  );
  await recordEvent({ teamId, actorId: userId, action: 'comment.created', targetType: 'comment', targetId: comment.id, data: { routeId, stepKey: place.stepKey } }, transaction);
  const recorded = await notifyNewComment({ comment, route: ctx.route, actorId: userId, mentionIds: mentions.map((m) => m.userId), includeOwner: true, transaction });
  return { comment, ctx, recorded };
}

export async function commentDto(comment: Comment, ctx: RouteContext): Promise<CommentDto> {
  return toCommentDto(comment, ctx, await userNames(namedUserIds([comment])));
}

export async function createComment(opts: { teamId: number; routeId: number; userId: number; input: CreateCommentInput }): Promise<CommentDto> {
  const { comment, ctx, recorded } = await getDb().sequelize.transaction((transaction) => insertComment({ ...opts, transaction }));
  await deliverNotificationMails(recorded.mails);
  return commentDto(comment, ctx);
}

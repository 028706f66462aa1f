import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { ThreadDto } from '../../schemas/comment';
import { recordEvent } from '../audit/record-event';
import { findComment } from './comment-context';
import { getThread } from './list-comments';

// Any member who may comment resolves or reopens a thread, through its first comment.
export async function resolveThread({ teamId, routeId, commentId, userId, resolved }: { teamId: number; routeId: number; commentId: number; userId: number; resolved: boolean }): Promise<ThreadDto> {
  const { sequelize } = getDb();
  return sequelize.transaction(async (transaction) => {
    const root = await findComment({ teamId, routeId, commentId, transaction });
    if (root.parentId !== null) throw new AppError('VALIDATION', 'Resolve a thread through its first comment.', { fields: { commentId: 'This comment is a reply.' } });
    await root.update(resolved ? { resolvedAt: new Date(), resolvedById: userId } : { resolvedAt: null, resolvedById: null }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: resolved ? 'comment.resolved' : 'comment.reopened', targetType: 'comment', targetId: root.id }, transaction);
    const thread = await getThread({ teamId, routeId, rootId: root.id, transaction });
    if (!thread) throw new AppError('NOT_FOUND', 'No such comment.');
    return thread;
  });
}

import 'server-only';
import { getDb } from '../../../db';
import { recordEvent } from '../audit/record-event';
import { findOwnComment, loadRouteContext } from './comment-context';

// Kept as a row with its text removed, so a thread with replies still shows "comment deleted" at its head.
export async function deleteComment({ teamId, routeId, commentId, userId }: { teamId: number; routeId: number; commentId: number; userId: number }): Promise<{ ok: true; id: number }> {
  const { sequelize } = getDb();
  await sequelize.transaction(async (transaction) => {
    await loadRouteContext({ teamId, routeId, transaction });
    const comment = await findOwnComment({ teamId, routeId, commentId, userId, transaction });
    await comment.update({ body: '', mentions: [], deletedAt: new Date() }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'comment.deleted', targetType: 'comment', targetId: comment.id }, transaction);
  });
  return { ok: true, id: commentId };
}

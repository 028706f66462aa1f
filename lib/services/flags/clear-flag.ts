import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { CommentDto } from '../../schemas/comment';
import type { ClearFlagInput, FlagDto } from '../../schemas/flag';
import { recordEvent } from '../audit/record-event';
import { forUpdate } from '../row-lock';
import { userNames } from '../comments/comment-context';
import { commentDto, insertComment } from '../comments/create-comment';
import { deliverNotificationMails } from '../notifications/record-notifications';
import { flagUserIds, toFlagDto } from './flag-dto';

// Clearing needs a reason: the comment is written on the flagged step and the flag cleared in one transaction.
export async function clearFlag({ teamId, routeId, flagId, userId, input }: { teamId: number; routeId: number; flagId: number; userId: number; input: ClearFlagInput }): Promise<{ flag: FlagDto; comment: CommentDto }> {
  const { sequelize, models } = getDb();
  const { flag, inserted } = await sequelize.transaction(async (transaction) => {
    const flag = Number.isInteger(flagId) && flagId > 0 ? await models.StepFlag.findOne({ where: { id: flagId, routeId, teamId }, ...forUpdate(transaction) }) : null;
    if (!flag) throw new AppError('NOT_FOUND', 'No such flag.');
    if (flag.clearedAt) throw new AppError('CONFLICT', 'This flag is already cleared.');
    const inserted = await insertComment({ teamId, routeId, userId, input: { body: input.comment, stepKey: flag.stepKey }, allowMissingStep: true, transaction });
    await flag.update({ clearedAt: new Date(), clearedById: userId, clearCommentId: inserted.comment.id }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'flag.cleared', targetType: 'step_flag', targetId: flag.id, data: { commentId: inserted.comment.id } }, transaction);
    return { flag, inserted };
  });
  await deliverNotificationMails(inserted.recorded.mails);
  return { flag: toFlagDto(flag, await userNames(flagUserIds([flag]))), comment: await commentDto(inserted.comment, inserted.ctx) };
}

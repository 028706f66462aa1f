import 'server-only';
import { Op } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { MarkReadInput } from '../../schemas/notification';
import { ownNotificationsWhere, unreadCount } from './list-notifications';

// Marks the named notifications (or all of them) read. An id that is not the caller's answers 404.
export async function markNotificationsRead({ userId, input }: { userId: number; input: MarkReadInput }): Promise<{ updated: number; unreadCount: number }> {
  const { sequelize, models } = getDb();
  const own = await ownNotificationsWhere(userId);
  const updated = await sequelize.transaction(async (transaction) => {
    if (input.ids) {
      const ids = [...new Set(input.ids)];
      const found = await models.Notification.count({ where: { ...own, id: { [Op.in]: ids } }, transaction });
      if (found !== ids.length) throw new AppError('NOT_FOUND', 'No such notification.');
      const [count] = await models.Notification.update({ readAt: new Date() }, { where: { ...own, id: { [Op.in]: ids }, readAt: null }, transaction });
      return count;
    }
    const [count] = await models.Notification.update({ readAt: new Date() }, { where: { ...own, readAt: null }, transaction });
    return count;
  });
  return { updated, unreadCount: await unreadCount(userId) };
}

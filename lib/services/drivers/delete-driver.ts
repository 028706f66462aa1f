import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { recordEvent } from '../audit/record-event';

export async function deleteDriver({ teamId, userId, driverId }: { teamId: number; userId: number; driverId: number }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await models.DriverReaction.findOne({ where: { id: driverId, teamId }, transaction });
    if (!row) throw new AppError('NOT_FOUND', 'No such driver reaction.');
    await row.destroy({ transaction });
    await recordEvent({ teamId, actorId: userId, action: 'driver.deleted', targetType: 'driver', targetId: driverId }, transaction);
    return { deleted: driverId };
  });
}

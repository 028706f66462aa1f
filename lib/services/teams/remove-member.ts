import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { recordEvent } from '../audit/record-event';
import { assertAnotherLeadRemains } from './last-lead';

export async function removeMember({ teamId, actorId, userId }: { teamId: number; actorId: number; userId: number }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const membership = await models.Membership.findOne({ where: { teamId, userId }, transaction });
    if (!membership) throw new AppError('NOT_FOUND', 'No such member in this team.');
    if (membership.role === 'lead') await assertAnotherLeadRemains({ teamId, userId, transaction });
    await membership.destroy({ transaction });
    await models.UserPreference.update({ activeTeamId: null }, { where: { userId, activeTeamId: teamId }, transaction });
    await recordEvent({ teamId, actorId, action: 'member.removed', targetType: 'user', targetId: userId }, transaction);
    return { removed: userId };
  });
}

import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { Role } from '../../auth/roles';
import { recordEvent } from '../audit/record-event';
import { assertAnotherLeadRemains } from './last-lead';

export async function changeMemberRole({ teamId, actorId, userId, role }: { teamId: number; actorId: number; userId: number; role: Role }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const membership = await models.Membership.findOne({ where: { teamId, userId }, transaction });
    if (!membership) throw new AppError('NOT_FOUND', 'No such member in this team.');
    if (membership.role === 'lead' && role !== 'lead') await assertAnotherLeadRemains({ teamId, userId, transaction });
    const from = membership.role;
    await membership.update({ role }, { transaction });
    await recordEvent({ teamId, actorId, action: 'member.role_changed', targetType: 'user', targetId: userId, data: { from, to: role } }, transaction);
    return { userId, role };
  });
}

import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { forUpdate } from '../row-lock';

// Every team keeps at least one lead, or nobody could manage it again.
// The team row is locked first, so two leads demoting or removing each other at once are counted one after the other.
export async function assertAnotherLeadRemains({ teamId, userId, transaction }: { teamId: number; userId: number; transaction: Transaction }) {
  await getDb().models.Team.findByPk(teamId, { attributes: ['id'], ...forUpdate(transaction) });
  const others = await getDb().models.Membership.count({ where: { teamId, role: 'lead', userId: { [Op.ne]: userId } }, transaction });
  if (others === 0) {
    throw new AppError('CONFLICT', 'This is the team’s last lead. Make someone else a lead first.');
  }
}

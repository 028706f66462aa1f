import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { recordEvent } from '../audit/record-event';
import { forUpdate } from '../row-lock';
import { invitationStatus, toInvitationDto } from './invitation-dto';

export async function revokeInvitation({ teamId, actorId, invitationId }: { teamId: number; actorId: number; invitationId: number }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await models.Invitation.findOne({ where: { id: invitationId, teamId }, ...forUpdate(transaction) });
    if (!row) throw new AppError('NOT_FOUND', 'No such invitation.');
    if (invitationStatus(row) !== 'pending') throw new AppError('CONFLICT', 'Only a pending invitation can be revoked.');
    await row.update({ revokedAt: new Date() }, { transaction });
    await recordEvent({ teamId, actorId, action: 'invitation.revoked', targetType: 'invitation', targetId: row.id }, transaction);
    return toInvitationDto(row);
  });
}

import 'server-only';
import { Op } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { Role } from '../../auth/roles';
import { sendInvitationMail } from '../../mail/invitation-mail';
import { recordEvent } from '../audit/record-event';
import { toInvitationDto } from './invitation-dto';
import { INVITATION_TTL_MS, newInvitationToken } from './token';

export async function createInvitation({ teamId, inviter, email, role }: { teamId: number; inviter: { id: number; name: string }; email: string; role: Role }) {
  const { sequelize, models } = getDb();
  const { token, tokenHash } = newInvitationToken();
  const { invitation, teamName } = await sequelize.transaction(async (transaction) => {
    const existingUser = await models.User.findOne({ where: { email }, transaction });
    if (existingUser && (await models.Membership.findOne({ where: { teamId, userId: existingUser.id }, transaction }))) {
      throw new AppError('CONFLICT', `${email} is already a member of this team.`, { fields: { email: 'Already a member.' } });
    }
    // A new invitation replaces any pending one for the same address.
    await models.Invitation.update(
      { revokedAt: new Date() },
      { where: { teamId, email, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } }, transaction },
    );
    const team = await models.Team.findByPk(teamId, { transaction });
    const row = await models.Invitation.create(
      { teamId, email, role, tokenHash, invitedById: inviter.id, expiresAt: new Date(Date.now() + INVITATION_TTL_MS) },
      { transaction },
    );
    await recordEvent({ teamId, actorId: inviter.id, action: 'invitation.created', targetType: 'invitation', targetId: row.id, data: { email, role } }, transaction);
    return { invitation: row, teamName: team?.name ?? 'your team' };
  });
  // Sent after commit: a mail failure leaves a valid invitation the lead can resend.
  let mailSent = true;
  try {
    await sendInvitationMail({ to: email, token, teamName, inviterName: inviter.name, role });
  } catch (error) {
    mailSent = false;
    console.error('[stepwell] invitation mail failed:', error);
  }
  return { invitation: toInvitationDto(invitation), mailSent };
}

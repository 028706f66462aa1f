import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import type { SessionUser } from '../../auth/session-user';
import type { AcceptInvitationInput } from '../../schemas/auth';
import { PASSWORD_MESSAGES, passwordContainsEmail } from '../../schemas/password';
import { recordEvent } from '../audit/record-event';
import { createUser } from '../users/create-user';
import { invitationStatus } from './invitation-dto';
import { findInvitationRow, STATUS_MESSAGES } from './find-invitation';

// Accepting signs the person up first when the address has no account yet.
export async function acceptInvitation({ token, sessionUser, input }: { token: string; sessionUser: SessionUser | null; input: AcceptInvitationInput }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const row = await findInvitationRow({ token, transaction });
    const status = invitationStatus(row);
    if (status !== 'pending') throw new AppError('GONE', STATUS_MESSAGES[status]);

    let userId: number;
    let created = false;
    const existing = await models.User.findOne({ where: { email: row.email }, transaction });
    if (sessionUser) {
      if (sessionUser.email !== row.email) {
        throw new AppError('FORBIDDEN', `This invitation was sent to ${row.email}. Sign out and accept it as that address.`);
      }
      userId = sessionUser.id;
    } else if (existing) {
      throw new AppError('UNAUTHENTICATED', `An account for ${row.email} exists. Sign in first, then open the link again.`);
    } else {
      const fields: Record<string, string> = {};
      if (!input.name) fields.name = 'Enter your name.';
      if (!input.password) fields.password = 'Choose a password of at least 10 characters.';
      else if (passwordContainsEmail(input.password, row.email)) fields.password = PASSWORD_MESSAGES.email;
      if (Object.keys(fields).length) throw new AppError('VALIDATION', 'Create your account to join.', { fields });
      const user = await createUser({ name: input.name!, email: row.email, password: input.password!, activeTeamId: row.teamId }, transaction);
      userId = user.id;
      created = true;
    }

    const already = await models.Membership.findOne({ where: { teamId: row.teamId, userId }, transaction });
    if (!already) await models.Membership.create({ teamId: row.teamId, userId, role: row.role }, { transaction });
    await row.update({ acceptedAt: new Date() }, { transaction });
    await models.UserPreference.update({ activeTeamId: row.teamId }, { where: { userId }, transaction });
    await recordEvent({ teamId: row.teamId, actorId: userId, action: 'invitation.accepted', targetType: 'invitation', targetId: row.id }, transaction);
    return { teamId: row.teamId, email: row.email, role: row.role, created };
  });
}

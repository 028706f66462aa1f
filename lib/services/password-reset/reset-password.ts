import 'server-only';
import { Op } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { hashPassword } from '../../auth/password';
import { revokeAllSessions } from '../../auth/session-policy';
import { PASSWORD_MESSAGES, passwordContainsEmail } from '../../schemas/password';
import { recordEvent } from '../audit/record-event';
import { hashResetToken } from './reset-token';

export type ResetTokenStatus = 'valid' | 'used' | 'expired' | 'unknown';

export const RESET_STATUS_MESSAGES: Record<Exclude<ResetTokenStatus, 'valid'>, string> = {
  unknown: 'This reset link is not valid. Check that you opened the whole link, or ask for a new one.',
  used: 'This reset link has already been used. Ask for a new one if you need to reset again.',
  expired: 'This reset link has expired (links last 1 hour). Ask for a new one.',
};

export async function resetTokenStatus({ token }: { token: string }): Promise<ResetTokenStatus> {
  const row = await getDb().models.PasswordResetToken.findOne({ where: { tokenHash: hashResetToken(token) } });
  if (!row) return 'unknown';
  if (row.usedAt) return 'used';
  return row.expiresAt.getTime() <= Date.now() ? 'expired' : 'valid';
}

// Sets the new password, spends the token and ends every session of the account, in one transaction.
export async function resetPassword({ token, password }: { token: string; password: string }): Promise<{ userId: number }> {
  const { sequelize, models } = getDb();
  const passwordHash = await hashPassword(password);
  return sequelize.transaction(async (transaction) => {
    const row = await models.PasswordResetToken.findOne({ where: { tokenHash: hashResetToken(token) }, transaction });
    if (!row) throw new AppError('NOT_FOUND', RESET_STATUS_MESSAGES.unknown);
    if (row.usedAt) throw new AppError('GONE', RESET_STATUS_MESSAGES.used);
    if (row.expiresAt.getTime() <= Date.now()) throw new AppError('GONE', RESET_STATUS_MESSAGES.expired);
    // Checked before the link is spent, so the person can try another password with the same link.
    const user = await models.User.findByPk(row.userId, { transaction });
    if (user && passwordContainsEmail(password, user.email)) {
      throw new AppError('VALIDATION', 'Choose another password.', { fields: { password: PASSWORD_MESSAGES.email } });
    }
    // The guard on used_at makes a second, simultaneous use of the same link fail.
    const [spent] = await models.PasswordResetToken.update({ usedAt: new Date() }, { where: { id: row.id, usedAt: { [Op.is]: null } }, transaction });
    if (spent !== 1) throw new AppError('GONE', RESET_STATUS_MESSAGES.used);
    await models.User.update({ passwordHash }, { where: { id: row.userId }, transaction });
    await models.PasswordResetToken.destroy({ where: { userId: row.userId, id: { [Op.ne]: row.id } }, transaction });
    await revokeAllSessions({ userId: row.userId, transaction });
    await recordEvent({ teamId: null, actorId: row.userId, action: 'user.password_reset', targetType: 'user', targetId: row.userId }, transaction);
    return { userId: row.userId };
  });
}

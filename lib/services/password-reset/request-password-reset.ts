import 'server-only';
import { Op } from 'sequelize';
import { getDb } from '../../../db';
import { sendPasswordResetMail } from '../../mail/password-reset-mail';
import { RESET_TOKEN_TTL_MS, newResetToken } from './reset-token';

const inFlight = new Set<Promise<void>>();

/** Starts the request in the background (the caller answers at once) and tracks it, so shutdown and tests can wait for it. */
export function startPasswordResetRequest({ email }: { email: string }): void {
  const work = requestPasswordReset({ email }).finally(() => inFlight.delete(work));
  inFlight.add(work);
}

export async function settlePasswordResetRequests(): Promise<void> {
  await Promise.all([...inFlight]);
}

/** Makes a token and mails it when the address has an account; does nothing otherwise. Never throws: failures are logged. */
export async function requestPasswordReset({ email }: { email: string }): Promise<void> {
  try {
    const { sequelize, models } = getDb();
    const user = await models.User.findOne({ where: { email } });
    if (!user) return;
    const { token, tokenHash } = newResetToken();
    await sequelize.transaction(async (transaction) => {
      // One live link per account: a new request replaces the earlier ones.
      await models.PasswordResetToken.destroy({ where: { userId: user.id, usedAt: { [Op.is]: null } }, transaction });
      await models.PasswordResetToken.create({ userId: user.id, tokenHash, expiresAt: new Date(Date.now() + RESET_TOKEN_TTL_MS) }, { transaction });
    });
    await sendPasswordResetMail({ to: user.email, token, name: user.name });
  } catch (error) {
    console.error('[stepwell] password reset request failed:', error);
  }
}

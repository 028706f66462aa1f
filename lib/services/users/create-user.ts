import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { hashPassword } from '../../auth/password';

export async function createUser(
  { name, email, password, activeTeamId }: { name: string; email: string; password: string; activeTeamId?: number },
  transaction: Transaction,
) {
  const { User, UserPreference } = getDb().models;
  const existing = await User.findOne({ where: { email }, transaction });
  if (existing) {
    throw new AppError('VALIDATION', 'That e-mail is already registered.', {
      fields: { email: 'An account with this e-mail already exists. Sign in instead.' },
    });
  }
  const user = await User.create({ name, email, passwordHash: await hashPassword(password) }, { transaction });
  await UserPreference.create({ userId: user.id, activeTeamId: activeTeamId ?? null }, { transaction });
  return user;
}

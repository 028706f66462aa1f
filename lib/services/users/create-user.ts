import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { isUniqueClash } from '../../api/write-collision';
import { hashPassword } from '../../auth/password';

export async function createUser(
  { name, email, password, activeTeamId }: { name: string; email: string; password: string; activeTeamId?: number },
  transaction: Transaction,
) {
  const { User, UserPreference } = getDb().models;
  const taken = () => new AppError('VALIDATION', 'That e-mail is already registered.', {
    fields: { email: 'An account with this e-mail already exists. Sign in instead.' },
  });
  if (await User.findOne({ where: { email }, transaction })) throw taken();
  // Two sign-ups with one address at the same moment both pass the check; the unique index stops the second.
  const user = await User.create({ name, email, passwordHash: await hashPassword(password) }, { transaction }).catch((error: unknown) => {
    throw isUniqueClash(error) ? taken() : error;
  });
  await UserPreference.create({ userId: user.id, activeTeamId: activeTeamId ?? null }, { transaction });
  return user;
}

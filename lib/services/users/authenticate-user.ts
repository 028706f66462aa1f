import 'server-only';
import { getDb } from '../../../db';
import { verifyPassword } from '../../auth/password';
import type { SignInInput } from '../../schemas/auth';

import { hashPassword } from '../../auth/password';

// Comparing against a real hash keeps the timing of "no such user" close to "wrong password".
let dummyHash: Promise<string> | undefined;

export async function authenticateUser({ email, password }: SignInInput) {
  const { User } = getDb().models;
  const user = await User.findOne({ where: { email } });
  dummyHash ??= hashPassword('not-a-real-password');
  const ok = await verifyPassword(password, user?.passwordHash ?? (await dummyHash));
  if (!user || !ok) return null;
  return { id: user.id, email: user.email, name: user.name };
}

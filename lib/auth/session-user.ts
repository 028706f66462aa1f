import 'server-only';
import { getToken } from 'next-auth/jwt';
import type { NextRequest } from 'next/server';
import { getDb } from '../../db';
import { authSecret } from '../env';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
}

// Reads the JWT from the request's cookie, then checks the user still exists.
export async function sessionUserFromRequest(req: NextRequest): Promise<SessionUser | null> {
  const token = await getToken({ req, secret: authSecret() });
  const id = Number(token?.sub);
  if (!Number.isInteger(id) || id <= 0) return null;
  const user = await getDb().models.User.findByPk(id);
  return user ? { id: user.id, email: user.email, name: user.name } : null;
}

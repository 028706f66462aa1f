import 'server-only';
import { getToken } from 'next-auth/jwt';
import type { NextRequest } from 'next/server';
import { authSecret } from '../env';
import { currentSessionUser } from './session-policy';

export interface SessionUser {
  id: number;
  email: string;
  name: string;
}

// Reads the JWT from the request's cookie, then checks the user still exists and the session was not revoked.
export async function sessionUserFromRequest(req: NextRequest): Promise<SessionUser | null> {
  const token = await getToken({ req, secret: authSecret() });
  const user = await currentSessionUser(token);
  return user ? { id: user.id, email: user.email, name: user.name } : null;
}

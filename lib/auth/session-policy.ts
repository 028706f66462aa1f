import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../db';

/** No session outlives this, however active: a stolen cookie cannot be kept alive by use. */
export const SESSION_ABSOLUTE_MAX_S = 7 * 24 * 60 * 60;

export interface SessionClaims {
  sub?: string;
  /** the user's session epoch when the session was issued (absent in tokens from before epochs: 0) */
  epoch?: unknown;
  /** seconds since 1970 of the sign-in itself (next-auth's iat moves on every refresh) */
  authAt?: unknown;
  iat?: unknown;
}

export class SessionRevokedError extends Error {
  constructor(reason: string) {
    super(reason);
    this.name = 'SessionRevokedError';
  }
}

function asNumber(value: unknown, fallback: number): number {
  return typeof value === 'number' && Number.isFinite(value) ? value : fallback;
}

// Loads the user and checks the claims against the epoch and the absolute lifetime; null when the session is no longer good.
export async function currentSessionUser(claims: SessionClaims | null, nowS = Math.floor(Date.now() / 1000)) {
  const id = Number(claims?.sub);
  if (!claims || !Number.isInteger(id) || id <= 0) return null;
  const authAt = asNumber(claims.authAt, asNumber(claims.iat, nowS));
  if (nowS - authAt > SESSION_ABSOLUTE_MAX_S) return null;
  const user = await getDb().models.User.findByPk(id);
  if (!user) return null;
  if (asNumber(claims.epoch, 0) !== user.sessionEpoch) return null;
  return user;
}

/** "Sign out everywhere": every session issued before this call stops working at its next request. */
export async function revokeAllSessions({ userId, transaction }: { userId: number; transaction?: Transaction }): Promise<void> {
  await getDb().models.User.increment('sessionEpoch', { by: 1, where: { id: userId }, transaction });
}

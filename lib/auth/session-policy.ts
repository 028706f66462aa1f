import 'server-only';
import { randomUUID } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../db';

/** No session outlives this, however active: a stolen cookie cannot be kept alive by use. */
export const SESSION_ABSOLUTE_MAX_S = 7 * 24 * 60 * 60;

export interface SessionClaims {
  sub?: string;
  /** the user's session epoch when the session was issued (absent in tokens from before epochs: 0) */
  epoch?: unknown;
  /** seconds since 1970 of the sign-in itself (next-auth's iat moves on every refresh) */
  authAt?: unknown;
  /** this session's id, set at sign-in and kept on every refresh (next-auth's own jti changes each time); absent in older tokens */
  sid?: unknown;
  iat?: unknown;
}

/** A fresh id for a session being signed in. */
export function newSessionId(): string {
  return randomUUID();
}

const sessionIdOf = (claims: SessionClaims): string | null => (typeof claims.sid === 'string' && claims.sid.length <= 64 ? claims.sid : null);

export class SessionRevokedError extends Error {
  constructor(reason: string) {
    super(reason);
    this.name = 'SessionRevokedError';
  }
}

function asNumber(value: unknown, fallback: number): number {
  return typeof value === 'number' && Number.isFinite(value) ? value : fallback;
}

// Loads the user and checks the claims against the epoch, the absolute lifetime and the signed-out sessions;
// null when the session is no longer good.
export async function currentSessionUser(claims: SessionClaims | null, nowS = Math.floor(Date.now() / 1000)) {
  const id = Number(claims?.sub);
  if (!claims || !Number.isInteger(id) || id <= 0) return null;
  const authAt = asNumber(claims.authAt, asNumber(claims.iat, nowS));
  if (nowS - authAt > SESSION_ABSOLUTE_MAX_S) return null;
  const sid = sessionIdOf(claims);
  const { User, RevokedSession } = getDb().models;
  const [user, revoked] = await Promise.all([User.findByPk(id), sid ? RevokedSession.findByPk(sid) : null]);
  if (!user || revoked) return null;
  if (asNumber(claims.epoch, 0) !== user.sessionEpoch) return null;
  return user;
}

/**
 * Sign-out: ends this one session on the server, so a copy of its cookie stops working too. The row lives as long as
 * the token could (the absolute limit from sign-in); ended rows are swept here. Tokens from before session ids
 * carry none and cannot be ended one by one: they run out within SESSION_ABSOLUTE_MAX_S, or "sign out everywhere".
 */
export async function revokeSession(claims: SessionClaims | null, now = new Date()): Promise<boolean> {
  const userId = Number(claims?.sub);
  const sessionId = claims ? sessionIdOf(claims) : null;
  if (!sessionId || !Number.isInteger(userId) || userId <= 0) return false;
  const authAt = asNumber(claims!.authAt, asNumber(claims!.iat, Math.floor(now.getTime() / 1000)));
  const expiresAt = new Date((authAt + SESSION_ABSOLUTE_MAX_S) * 1000);
  const { sequelize, models } = getDb();
  await sequelize.transaction(async (transaction) => {
    if (!(await models.User.findByPk(userId, { transaction }))) return;
    // Signing out twice (two tabs) is not an error.
    await models.RevokedSession.bulkCreate([{ sessionId, userId, expiresAt }], { ignoreDuplicates: true, transaction });
    await models.RevokedSession.destroy({ where: { expiresAt: { [Op.lte]: now } }, transaction });
  });
  return true;
}

/** "Sign out everywhere": every session issued before this call stops working at its next request. */
export async function revokeAllSessions({ userId, transaction }: { userId: number; transaction?: Transaction }): Promise<void> {
  await getDb().models.User.increment('sessionEpoch', { by: 1, where: { id: userId }, transaction });
}

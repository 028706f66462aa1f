import crypto from 'node:crypto';

export const RESET_TOKEN_TTL_MS = 60 * 60 * 1000;

export function newResetToken(): { token: string; tokenHash: string } {
  const token = crypto.randomBytes(32).toString('base64url');
  return { token, tokenHash: hashResetToken(token) };
}

// Only the hash is stored, so a copy of the database (or a backup) cannot reset anyone's password.
export function hashResetToken(token: string): string {
  return crypto.createHash('sha256').update(token).digest('hex');
}

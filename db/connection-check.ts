import { describeTarget, type DatabaseTarget } from './database-target';
import type { Sequelize } from 'sequelize';

/** The start-up failure message: what could not be reached and why, never the password. */
export function unreachableMessage(target: DatabaseTarget, error: unknown): string {
  const original = (error as { original?: { code?: unknown; message?: unknown } } | null)?.original;
  let reason = String(original?.message || (error instanceof Error ? error.message : error) || 'unknown error');
  if (target.dialect === 'postgres') {
    const password = decodeURIComponent(new URL(target.url).password);
    if (password) reason = reason.split(password).join('***');
  }
  const code = typeof original?.code === 'string' ? ` (${original.code})` : '';
  const hint =
    target.dialect === 'postgres'
      ? 'Check DATABASE_URL (host, port, user, database; its password is not shown here) and that the server accepts connections from this machine.'
      : 'Check DATABASE_PATH and that its folder is writable.';
  return `Stepwell cannot reach the ${describeTarget(target)}: ${reason}${code}. ${hint}`;
}

/** Connects once, so a bad DATABASE_URL stops start-up with a clear message instead of failing on the first request. */
export async function assertDatabaseReachable(sequelize: Sequelize, target: DatabaseTarget): Promise<void> {
  try {
    await sequelize.authenticate();
  } catch (error) {
    throw new DatabaseUnreachableError(unreachableMessage(target, error));
  }
}

export class DatabaseUnreachableError extends Error {
  override name = 'DatabaseUnreachableError';
}

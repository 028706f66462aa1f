import { DatabaseError, UniqueConstraintError } from 'sequelize';

type Original = { code?: unknown; message?: unknown } | undefined;
const originalOf = (error: Error): Original => (error as Error & { original?: Original }).original;

/**
 * A unique index refused a row: two requests created the same thing at once. Sequelize's SQLite dialect reports every
 * constraint failure (CHECK, trigger aborts) as UniqueConstraintError, so the driver's own code or message decides.
 */
export function isUniqueClash(error: unknown): boolean {
  if (!(error instanceof UniqueConstraintError)) return false;
  const original = originalOf(error);
  return original?.code === '23505' || /UNIQUE constraint failed/.test(String(original?.message ?? ''));
}

/** SQLSTATE 40001 serialization failure, 40P01 deadlock detected: PostgreSQL rolled back one of several concurrent writers. */
export function isWriteCollision(error: unknown): boolean {
  if (!(error instanceof DatabaseError)) return false;
  const code = originalOf(error)?.code;
  return code === '40001' || code === '40P01';
}

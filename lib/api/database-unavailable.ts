import { ConnectionError, DatabaseError, TimeoutError } from 'sequelize';

// PostgreSQL SQLSTATE classes that mean the connection, not the request, failed: 08 connection exception,
// 57P01–57P03 server shutting down or restarting (also what a terminated backend reports).
const PG_CONNECTION_CODES = /^(08...|57P0[123])$/;
const DROPPED = /Connection terminated|connection error and is not queryable|ECONNRESET|ECONNREFUSED|EPIPE/i;

/** True when an error means the database could not be reached or dropped the connection: answer 503, try again. */
export function isDatabaseUnavailable(error: unknown): boolean {
  if (error instanceof ConnectionError || error instanceof TimeoutError) return true;
  if (!(error instanceof DatabaseError)) return false;
  const original = (error as DatabaseError & { original?: { code?: unknown; message?: unknown } }).original;
  const code = typeof original?.code === 'string' ? original.code : '';
  if (PG_CONNECTION_CODES.test(code) || code === 'SQLITE_BUSY') return true;
  return DROPPED.test(String(original?.message ?? error.message));
}

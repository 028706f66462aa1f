import pg from 'pg';
import type { DatabaseTarget } from './database-target';

// Several instances may start at once against one PostgreSQL database; the migrations and the demo seed must
// run once. A session-level advisory lock on its own connection (keyed by the database) makes the others wait.
export async function withMigrationLock<T>(target: DatabaseTarget, work: () => Promise<T>): Promise<T> {
  if (target.dialect !== 'postgres') return work(); // one SQLite file: the write queue and SQLite's lock suffice
  const client = new pg.Client({ connectionString: target.url });
  await client.connect();
  try {
    await client.query("SELECT pg_advisory_lock(hashtext('stepwell-migrations:' || current_database()))");
    return await work();
  } finally {
    await client.end(); // ending the session releases the lock
  }
}

import { closeDb, getDb } from '../db';
import { assertDatabaseReachable, DatabaseUnreachableError } from '../db/connection-check';
import { migrateUp } from '../db/migrate';
import { withMigrationLock } from '../db/migration-lock';
import { runSeeders } from '../db/seeders';

export async function migrateAndSeed({ seed }: { seed: boolean }): Promise<void> {
  const db = getDb();
  try {
    await assertDatabaseReachable(db.sequelize, db.target);
    await withMigrationLock(db.target, async () => {
      const applied = await migrateUp(db.sequelize);
      if (applied.length) console.log(`[db] applied migrations: ${applied.join(', ')}`);
      if (seed) {
        const seeded = await runSeeders(db);
        if (seeded.length) console.log(`[db] seeded: ${seeded.join(', ')}`);
      }
    });
  } finally {
    await closeDb();
  }
}

/** For the scripts' catch: a clear one-line message for an unreachable database, the full error otherwise. */
export function reportStartupError(error: unknown): void {
  console.error(error instanceof DatabaseUnreachableError ? `[stepwell] ${error.message}` : error);
}

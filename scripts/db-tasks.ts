import { closeDb, getDb } from '../db';
import { migrateUp } from '../db/migrate';
import { runSeeders } from '../db/seeders';

export async function migrateAndSeed({ seed }: { seed: boolean }): Promise<void> {
  const db = getDb();
  try {
    const applied = await migrateUp(db.sequelize);
    if (applied.length) console.log(`[db] applied migrations: ${applied.join(', ')}`);
    if (seed) {
      const seeded = await runSeeders(db);
      if (seeded.length) console.log(`[db] seeded: ${seeded.join(', ')}`);
    }
  } finally {
    await closeDb();
  }
}

import { databaseTarget, describeTarget } from '../../db/database-target';

// db:backup, db:restore and db:reset work on the SQLite file; a PostgreSQL server has its own tools for that.
export function exitUnlessSqlite(command: string): void {
  const target = databaseTarget();
  if (target.dialect === 'sqlite') return;
  console.error(
    `[${command}] DATABASE_URL selects ${describeTarget(target)}. ${command} works on the SQLite file only; ` +
      'back up PostgreSQL with pg_dump --format=custom, restore with pg_restore, reset with dropdb/createdb then npm run db:seed (README, "Running for a whole site").',
  );
  process.exit(2);
}

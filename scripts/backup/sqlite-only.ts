import { databaseTarget, describeTarget } from '../../db/database-target';

// db:backup and db:restore copy the SQLite file; a PostgreSQL server has its own tools for that.
export function exitUnlessSqlite(command: string): void {
  const target = databaseTarget();
  if (target.dialect === 'sqlite') return;
  console.error(
    `[${command}] DATABASE_URL selects ${describeTarget(target)}. ${command} copies the SQLite file only; ` +
      'back up PostgreSQL with pg_dump --format=custom and restore with pg_restore (README, "Running for a whole site").',
  );
  process.exit(2);
}

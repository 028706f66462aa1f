import { getDb } from '@/db';
import { onPostgres } from './test-db';

/** Makes every UPDATE of `column` on `table` fail inside the database, on SQLite or PostgreSQL; returns the undo. */
export async function failUpdatesOf(table: string, column: string): Promise<() => Promise<void>> {
  const { sequelize } = getDb();
  const name = `test_fail_${table}_${column}`;
  if (onPostgres) {
    await sequelize.query(`CREATE FUNCTION ${name}() RETURNS trigger AS $$ BEGIN RAISE EXCEPTION 'simulated failure'; END $$ LANGUAGE plpgsql`);
    await sequelize.query(`CREATE TRIGGER ${name} BEFORE UPDATE OF ${column} ON ${table} FOR EACH ROW EXECUTE FUNCTION ${name}()`);
    return async () => {
      await sequelize.query(`DROP TRIGGER ${name} ON ${table}`);
      await sequelize.query(`DROP FUNCTION ${name}()`);
    };
  }
  await sequelize.query(`CREATE TRIGGER ${name} BEFORE UPDATE OF ${column} ON ${table} BEGIN SELECT RAISE(ABORT, 'simulated failure'); END`);
  return async () => {
    await sequelize.query(`DROP TRIGGER ${name}`);
  };
}

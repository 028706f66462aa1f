import { SequelizeStorage, Umzug } from 'umzug';
import type { QueryInterface, Sequelize } from 'sequelize';
import { MIGRATIONS } from './migrations';

function migrator(sequelize: Sequelize) {
  return new Umzug<QueryInterface>({
    migrations: MIGRATIONS.map(({ name, module }) => ({
      name,
      up: ({ context }) => module.up({ context }),
      down: ({ context }) => module.down({ context }),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

export async function migrateUp(sequelize: Sequelize): Promise<string[]> {
  const applied = await migrator(sequelize).up();
  return applied.map((m) => m.name);
}

export async function migrateDownAll(sequelize: Sequelize): Promise<void> {
  await migrator(sequelize).down({ to: 0 });
}

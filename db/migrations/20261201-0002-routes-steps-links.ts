import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('routes', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(160), allowNull: false },
    target: { type: DataTypes.STRING(120), allowNull: false },
    target_amount: { type: DataTypes.STRING(64), allowNull: false, defaultValue: '1 mol' },
    status: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'draft' },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    marginal_threshold_kj: { type: DataTypes.FLOAT, allowNull: false, defaultValue: -17 },
    origin_route_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'routes', key: 'id' }, onDelete: 'SET NULL' },
    created_by_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    updated_by_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    // Cached from the last evaluation so the list never re-runs the engine.
    step_count: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    overall_dg_kj: { type: DataTypes.FLOAT, allowNull: true },
    uphill_steps: { type: DataTypes.INTEGER, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('routes', ['team_id', 'archived_at', 'updated_at'], { name: 'routes_team_list' });
  await qi.addIndex('routes', ['team_id', 'name'], { name: 'routes_team_name' });
  await qi.addIndex('routes', ['origin_route_id'], { name: 'routes_origin' });
  await qi.addIndex('routes', ['created_by_id'], { name: 'routes_created_by' });
  await qi.addIndex('routes', ['updated_by_id'], { name: 'routes_updated_by' });

  await qi.createTable('steps', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    route_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'routes', key: 'id' }, onDelete: 'CASCADE' },
    step_key: { type: DataTypes.STRING(64), allowNull: false },
    sort_order: { type: DataTypes.INTEGER, allowNull: false },
    equation: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    conditions: { type: DataTypes.JSON, allowNull: false },
    yield_pct: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 100 },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    position_x: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
    position_y: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex('steps', ['route_id', 'step_key'], { unique: true, name: 'steps_route_key' });
  await qi.addIndex('steps', ['route_id', 'updated_at'], { name: 'steps_route_updated' });

  await qi.createTable('step_links', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    route_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'routes', key: 'id' }, onDelete: 'CASCADE' },
    from_key: { type: DataTypes.STRING(64), allowNull: false },
    to_key: { type: DataTypes.STRING(64), allowNull: false },
    species: { type: DataTypes.STRING(120), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('step_links', ['route_id'], { name: 'step_links_route' });

  await qi.createTable('driver_reactions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(160), allowNull: false },
    equation: { type: DataTypes.STRING(500), allowNull: false },
    basis: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
    created_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  });
  await qi.addIndex('driver_reactions', ['team_id'], { name: 'driver_reactions_team' });
  await qi.addIndex('driver_reactions', ['created_by_id'], { name: 'driver_reactions_created_by' });
  await qi.addColumn('teams', 'drivers_seeded_at', { type: DataTypes.DATE, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('teams', 'drivers_seeded_at');
  for (const table of ['driver_reactions', 'step_links', 'steps', 'routes']) await qi.dropTable(table);
}

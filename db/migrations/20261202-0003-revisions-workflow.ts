import { DataTypes, type QueryInterface } from 'sequelize';

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('routes', 'deleted_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('routes', 'deleted_by_id', { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' });
  await qi.addIndex('routes', ['team_id', 'deleted_at'], { name: 'routes_team_deleted' });
  await qi.addIndex('routes', ['deleted_by_id'], { name: 'routes_deleted_by' });

  await qi.createTable('route_revisions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    route_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'routes', key: 'id' }, onDelete: 'CASCADE' },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    version: { type: DataTypes.INTEGER, allowNull: false },
    author_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    summary: { type: DataTypes.STRING(300), allowNull: false },
    snapshot: { type: DataTypes.TEXT, allowNull: false },
    // ΔG per mol of reaction by step key, and the overall ΔG, from the save's own evaluation.
    step_dg: { type: DataTypes.JSON, allowNull: false },
    overall_dg_kj: { type: DataTypes.FLOAT, allowNull: true },
    restored_from_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'route_revisions', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('route_revisions', ['route_id', 'version'], { unique: true, name: 'route_revisions_route_version' });
  await qi.addIndex('route_revisions', ['team_id'], { name: 'route_revisions_team' });
  await qi.addIndex('route_revisions', ['author_id'], { name: 'route_revisions_author' });
  await qi.addIndex('route_revisions', ['restored_from_id'], { name: 'route_revisions_restored_from' });

  await qi.createTable('route_transitions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    route_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'routes', key: 'id' }, onDelete: 'CASCADE' },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    from_status: { type: DataTypes.STRING(24), allowNull: false },
    to_status: { type: DataTypes.STRING(24), allowNull: false },
    actor_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    route_version: { type: DataTypes.INTEGER, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('route_transitions', ['route_id', 'id'], { name: 'route_transitions_route' });
  await qi.addIndex('route_transitions', ['team_id', 'created_at'], { name: 'route_transitions_team_time' });
  await qi.addIndex('route_transitions', ['actor_id'], { name: 'route_transitions_actor' });

  // The reviewers named when a route was sent for review, one row per person per submission.
  await qi.createTable('route_reviewers', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    route_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'routes', key: 'id' }, onDelete: 'CASCADE' },
    transition_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'route_transitions', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('route_reviewers', ['transition_id', 'user_id'], { unique: true, name: 'route_reviewers_transition_user' });
  await qi.addIndex('route_reviewers', ['route_id'], { name: 'route_reviewers_route' });
  await qi.addIndex('route_reviewers', ['user_id'], { name: 'route_reviewers_user' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const table of ['route_reviewers', 'route_transitions', 'route_revisions']) await qi.dropTable(table);
  await qi.removeIndex('routes', 'routes_deleted_by');
  await qi.removeIndex('routes', 'routes_team_deleted');
  // Sequelize's sqlite removeColumn rebuilds the table (dropping its indexes and cascading deletes); SQLite drops a column in place.
  await qi.sequelize.query('ALTER TABLE routes DROP COLUMN deleted_by_id');
  await qi.sequelize.query('ALTER TABLE routes DROP COLUMN deleted_at');
}

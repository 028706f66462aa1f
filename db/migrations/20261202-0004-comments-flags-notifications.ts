import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

const MUTE_COLUMNS = ['mute_review_request', 'mute_mention', 'mute_status_change', 'mute_comment_on_owned_route'] as const;

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('comments', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    route_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'routes', key: 'id' }, onDelete: 'CASCADE' },
    // The step's client key ("s1"); steps are rewritten on every save, so there is no foreign key to them.
    step_key: { type: DataTypes.STRING(64), allowNull: true },
    parent_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'comments', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    body: { type: DataTypes.TEXT, allowNull: false },
    mentions: { type: DataTypes.JSON, allowNull: false },
    route_version: { type: DataTypes.INTEGER, allowNull: false },
    step_fingerprint: { type: DataTypes.STRING(64), allowNull: true },
    resolved_at: { type: DataTypes.DATE, allowNull: true },
    resolved_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    edited_at: { type: DataTypes.DATE, allowNull: true },
    deleted_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('comments', ['route_id', 'created_at'], { name: 'comments_route_time' });
  await qi.addIndex('comments', ['route_id', 'step_key'], { name: 'comments_route_step' });
  await qi.addIndex('comments', ['team_id'], { name: 'comments_team' });
  await qi.addIndex('comments', ['parent_id'], { name: 'comments_parent' });
  await qi.addIndex('comments', ['author_id'], { name: 'comments_author' });
  await qi.addIndex('comments', ['resolved_by_id'], { name: 'comments_resolved_by' });

  await qi.createTable('step_flags', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    route_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'routes', key: 'id' }, onDelete: 'CASCADE' },
    step_key: { type: DataTypes.STRING(64), allowNull: false },
    category: { type: DataTypes.STRING(24), allowNull: false },
    reason: { type: DataTypes.TEXT, allowNull: false },
    created_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    cleared_at: { type: DataTypes.DATE, allowNull: true },
    cleared_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    clear_comment_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'comments', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  });
  await qi.addIndex('step_flags', ['route_id', 'cleared_at', 'step_key'], { name: 'step_flags_route_open' });
  await qi.addIndex('step_flags', ['team_id'], { name: 'step_flags_team' });
  await qi.addIndex('step_flags', ['created_by_id'], { name: 'step_flags_created_by' });
  await qi.addIndex('step_flags', ['cleared_by_id'], { name: 'step_flags_cleared_by' });
  await qi.addIndex('step_flags', ['clear_comment_id'], { name: 'step_flags_clear_comment' });

  await qi.createTable('notifications', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    kind: { type: DataTypes.STRING(32), allowNull: false },
    route_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'routes', key: 'id' }, onDelete: 'CASCADE' },
    step_key: { type: DataTypes.STRING(64), allowNull: true },
    actor_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    title: { type: DataTypes.STRING(300), allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    link: { type: DataTypes.STRING(300), allowNull: false },
    read_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  // The list is newest first by id (keyset paging on id).
  await qi.addIndex('notifications', ['user_id', 'id'], { name: 'notifications_user_newest' });
  await qi.addIndex('notifications', ['user_id', 'read_at'], { name: 'notifications_user_unread' });
  await qi.addIndex('notifications', ['team_id'], { name: 'notifications_team' });
  await qi.addIndex('notifications', ['route_id'], { name: 'notifications_route' });
  await qi.addIndex('notifications', ['actor_id'], { name: 'notifications_actor' });

  for (const column of MUTE_COLUMNS) {
    await qi.addColumn('user_preferences', column, { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
  }
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  // SQLite's own DROP COLUMN keeps the table's other indexes, unlike Sequelize's copy-and-rename.
  for (const column of MUTE_COLUMNS) await qi.sequelize.query(`ALTER TABLE user_preferences DROP COLUMN ${column}`);
  for (const table of ['notifications', 'step_flags', 'comments']) await qi.dropTable(table);
}

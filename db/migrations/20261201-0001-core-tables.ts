import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('teams', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('memberships', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    role: { type: DataTypes.STRING(16), allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('memberships', ['team_id', 'user_id'], { unique: true, name: 'memberships_team_user' });
  await qi.addIndex('memberships', ['user_id'], { name: 'memberships_user' });

  await qi.createTable('invitations', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    invited_by_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' } },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('invitations', ['team_id'], { name: 'invitations_team' });
  await qi.addIndex('invitations', ['invited_by_id'], { name: 'invitations_invited_by' });

  await qi.createTable('audit_events', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'teams', key: 'id' }, onDelete: 'SET NULL' },
    actor_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    action: { type: DataTypes.STRING(64), allowNull: false },
    target_type: { type: DataTypes.STRING(32), allowNull: true },
    target_id: { type: DataTypes.STRING(64), allowNull: true },
    data: { type: DataTypes.JSON, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('audit_events', ['team_id', 'created_at'], { name: 'audit_events_team_time' });
  await qi.addIndex('audit_events', ['actor_id'], { name: 'audit_events_actor' });

  await qi.createTable('user_preferences', {
    user_id: { type: DataTypes.INTEGER, primaryKey: true, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    energy_unit: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'kJ' },
    temperature_unit: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'K' },
    pressure_unit: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'bar' },
    active_team_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'teams', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  });
  await qi.addIndex('user_preferences', ['active_team_id'], { name: 'user_preferences_active_team' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const table of ['user_preferences', 'audit_events', 'invitations', 'memberships', 'teams', 'users']) {
    await qi.dropTable(table);
  }
}

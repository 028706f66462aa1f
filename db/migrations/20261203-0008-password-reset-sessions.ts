import { DataTypes, type QueryInterface } from 'sequelize';

// Password reset tokens (only the SHA-256 of the token is kept) and a per-user session epoch for "sign out everywhere".
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('password_reset_tokens', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('password_reset_tokens', ['user_id'], { name: 'password_reset_tokens_user' });
  // A JWT carries the epoch it was issued under; raising it invalidates every earlier session of that user.
  await qi.addColumn('users', 'session_epoch', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('users', 'session_epoch');
  await qi.dropTable('password_reset_tokens');
}

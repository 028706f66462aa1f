import { DataTypes, type QueryInterface } from 'sequelize';

// Sessions ended one at a time (an ordinary sign-out): a JWT carrying a listed session id is refused until it would
// have expired anyway, after which its row is swept.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('revoked_sessions', {
    session_id: { type: DataTypes.STRING(64), allowNull: false, primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('revoked_sessions', ['user_id'], { name: 'revoked_sessions_user' });
  // The sweep deletes by expiry.
  await qi.addIndex('revoked_sessions', ['expires_at'], { name: 'revoked_sessions_expires' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('revoked_sessions');
}

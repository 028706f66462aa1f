import { DataTypes, type QueryInterface } from 'sequelize';

// Fixed-window rate-limit counters shared by every app instance (STATE_STORE=database).
// Times are epoch milliseconds in BIGINTs: the one hit statement compares and sets them the same way on SQLite and PostgreSQL.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('rate_limit_windows', {
    key: { type: DataTypes.TEXT, allowNull: false, primaryKey: true },
    count: { type: DataTypes.INTEGER, allowNull: false },
    window_start: { type: DataTypes.BIGINT, allowNull: false },
    expires_at: { type: DataTypes.BIGINT, allowNull: false },
  });
  // The sweep deletes ended windows of every limiter by expiry.
  await qi.addIndex('rate_limit_windows', ['expires_at'], { name: 'rate_limit_windows_expires' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('rate_limit_windows');
}

import { DataTypes, type QueryInterface } from 'sequelize';

// A person who has read the long safety caution may fold it to one line; the choice follows them across devices.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('user_preferences', 'caution_collapsed', { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  // SQLite's own DROP COLUMN keeps the table's other indexes, unlike Sequelize's copy-and-rename.
  await qi.sequelize.query('ALTER TABLE user_preferences DROP COLUMN caution_collapsed');
}

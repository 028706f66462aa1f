import { DataTypes, type QueryInterface } from 'sequelize';

// The team's decision log: never edited or deleted, only superseded by a newer decision about the same routes.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('decisions', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    // Routes are only soft-deleted; SET NULL keeps the record should one ever be purged (the snapshot keeps its name).
    chosen_route_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'routes', key: 'id' }, onDelete: 'SET NULL' },
    /** the compared route ids, in the order compared (JSON array) */
    route_ids: { type: DataTypes.JSON, allowNull: false },
    /** the routes this decision moved to shelved (JSON array) */
    shelved_route_ids: { type: DataTypes.JSON, allowNull: false },
    rationale: { type: DataTypes.TEXT, allowNull: false },
    /** the comparison's what-if, metrics, best values and shared steps when the decision was made */
    snapshot: { type: DataTypes.JSON, allowNull: false },
    author_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    superseded_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'decisions', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  // The log is newest first by id; superseding reads the team's current decisions.
  await qi.addIndex('decisions', ['team_id', 'id'], { name: 'decisions_team_newest' });
  await qi.addIndex('decisions', ['team_id', 'superseded_by_id'], { name: 'decisions_team_current' });
  await qi.addIndex('decisions', ['chosen_route_id'], { name: 'decisions_chosen_route' });
  await qi.addIndex('decisions', ['author_id'], { name: 'decisions_author' });
  await qi.addIndex('decisions', ['superseded_by_id'], { name: 'decisions_superseded_by' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('decisions');
}

import { DataTypes, type QueryInterface } from 'sequelize';

// A team species may be known by its structure: canonical SMILES and InChIKey. Two species are the same when
// InChIKey and phase agree, so a team looks its own structures up by (team, InChIKey).
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('team_species', 'smiles', { type: DataTypes.STRING(600), allowNull: true });
  await qi.addColumn('team_species', 'inchikey', { type: DataTypes.STRING(27), allowNull: true });
  await qi.addIndex('team_species', ['team_id', 'inchikey'], { name: 'team_species_team_inchikey' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeIndex('team_species', 'team_species_team_inchikey');
  // SQLite's own DROP COLUMN keeps the table's other indexes, unlike Sequelize's copy-and-rename (standard SQL, PostgreSQL too).
  await qi.sequelize.query('ALTER TABLE team_species DROP COLUMN inchikey');
  await qi.sequelize.query('ALTER TABLE team_species DROP COLUMN smiles');
}

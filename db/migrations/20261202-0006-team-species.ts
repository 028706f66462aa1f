import { DataTypes, type QueryInterface } from 'sequelize';

// A team's own species (shadowing built-ins of the same key for that team only) and the CSV files they came from.
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('species_imports', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    /** SHA-256 of the bytes as uploaded, hex */
    checksum: { type: DataTypes.STRING(64), allowNull: false },
    byte_size: { type: DataTypes.INTEGER, allowNull: false },
    row_count: { type: DataTypes.INTEGER, allowNull: false },
    /** where the storage keeps the original file, relative to its root */
    storage_key: { type: DataTypes.STRING(255), allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'preview' },
    imported_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_count: { type: DataTypes.INTEGER, allowNull: true },
    overridden_count: { type: DataTypes.INTEGER, allowNull: true },
    skipped_count: { type: DataTypes.INTEGER, allowNull: true },
    committed_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('species_imports', ['team_id', 'id'], { name: 'species_imports_team_newest' });
  await qi.addIndex('species_imports', ['imported_by_id'], { name: 'species_imports_importer' });

  await qi.createTable('team_species', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    /** the engine key, e.g. "C7H6O3(s)" */
    key: { type: DataTypes.STRING(120), allowNull: false },
    formula: { type: DataTypes.STRING(80), allowNull: false },
    phase: { type: DataTypes.STRING(4), allowNull: false },
    form: { type: DataTypes.STRING(40), allowNull: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    aliases: { type: DataTypes.JSON, allowNull: false },
    elements: { type: DataTypes.JSON, allowNull: false },
    charge: { type: DataTypes.INTEGER, allowNull: false },
    dfh_kj: { type: DataTypes.DOUBLE, allowNull: false },
    dfg_kj: { type: DataTypes.DOUBLE, allowNull: false },
    /** true when ΔfG° was computed from ΔfH° and S° rather than given */
    dfg_derived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    s_j_per_k: { type: DataTypes.DOUBLE, allowNull: false },
    cp_j_per_k: { type: DataTypes.DOUBLE, allowNull: true },
    cp_tmin_k: { type: DataTypes.DOUBLE, allowNull: true },
    cp_tmax_k: { type: DataTypes.DOUBLE, allowNull: true },
    sigma_dfh_kj: { type: DataTypes.DOUBLE, allowNull: true },
    sigma_dfg_kj: { type: DataTypes.DOUBLE, allowNull: true },
    sigma_s_j_per_k: { type: DataTypes.DOUBLE, allowNull: true },
    /** citation | measured | estimated */
    provenance_kind: { type: DataTypes.STRING(16), allowNull: false },
    /** the citation, the data set or notebook reference, or the estimation method */
    provenance_text: { type: DataTypes.TEXT, allowNull: false },
    /** the saved fit behind a measured value; the fits table comes later, so no foreign key here */
    fit_id: { type: DataTypes.INTEGER, allowNull: true },
    import_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'species_imports', key: 'id' }, onDelete: 'SET NULL' },
    notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    created_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    updated_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('team_species', ['team_id', 'key'], { name: 'team_species_team_key', unique: true });
  await qi.addIndex('team_species', ['team_id', 'phase'], { name: 'team_species_team_phase' });
  await qi.addIndex('team_species', ['import_id'], { name: 'team_species_import' });
  await qi.addIndex('team_species', ['fit_id'], { name: 'team_species_fit' });
  await qi.addIndex('team_species', ['created_by_id'], { name: 'team_species_created_by' });
  await qi.addIndex('team_species', ['updated_by_id'], { name: 'team_species_updated_by' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('team_species');
  await qi.dropTable('species_imports');
}

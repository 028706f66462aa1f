import { DataTypes, type QueryInterface } from 'sequelize';

// Equilibrium-data sets (K measured at several T, editable) and saved van 't Hoff fits (never edited: each keeps its raw data).
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('fit_data_sets', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(160), allowNull: false },
    /** the reaction the K values belong to; '' when not linked */
    equation: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    temperature_unit: { type: DataTypes.STRING(8), allowNull: false },
    value_kind: { type: DataTypes.STRING(8), allowNull: false },
    /** how the points arrived: csv, paste or grid */
    source: { type: DataTypes.STRING(8), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    /** [{ T, value, sigma, excluded, reason }] in the set's own unit and kind */
    points: { type: DataTypes.JSON, allowNull: false },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    created_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    updated_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('fit_data_sets', ['team_id', 'updated_at'], { name: 'fit_data_sets_team_recent' });
  await qi.addIndex('fit_data_sets', ['created_by_id'], { name: 'fit_data_sets_created_by' });
  await qi.addIndex('fit_data_sets', ['updated_by_id'], { name: 'fit_data_sets_updated_by' });

  await qi.createTable('fits', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
    team_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    // A data set with saved fits cannot be deleted (409), so this only guards against a purge.
    data_set_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'fit_data_sets', key: 'id' }, onDelete: 'SET NULL' },
    name: { type: DataTypes.STRING(160), allowNull: false },
    equation: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    /** the data set as fitted: { name, temperatureUnit, valueKind, note, points } */
    raw_data: { type: DataTypes.JSON, allowNull: false },
    /** ΔH°, ΔS°, standard errors, covariance, R², n, weighted, T range */
    result: { type: DataTypes.JSON, allowNull: false },
    delta_h0_kj: { type: DataTypes.FLOAT, allowNull: false },
    delta_s0_j_per_k: { type: DataTypes.FLOAT, allowNull: false },
    created_by_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('fits', ['team_id', 'id'], { name: 'fits_team_newest' });
  await qi.addIndex('fits', ['data_set_id'], { name: 'fits_data_set' });
  await qi.addIndex('fits', ['created_by_id'], { name: 'fits_created_by' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('fits');
  await qi.dropTable('fit_data_sets');
}

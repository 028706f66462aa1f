import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// One uploaded species CSV: stored as sent, previewed, then committed all at once (or never).
export class SpeciesImport extends Model<InferAttributes<SpeciesImport>, InferCreationAttributes<SpeciesImport>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare fileName: string;
  declare checksum: string;
  declare byteSize: number;
  declare rowCount: number;
  declare storageKey: string;
  declare status: CreationOptional<'preview' | 'committed'>;
  declare importedById: number | null;
  declare createdCount: CreationOptional<number | null>;
  declare overriddenCount: CreationOptional<number | null>;
  declare skippedCount: CreationOptional<number | null>;
  declare committedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
}

export function initSpeciesImport(sequelize: Sequelize): typeof SpeciesImport {
  SpeciesImport.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      fileName: { type: DataTypes.STRING(255), allowNull: false, field: 'file_name' },
      checksum: { type: DataTypes.STRING(64), allowNull: false },
      byteSize: { type: DataTypes.INTEGER, allowNull: false, field: 'byte_size' },
      rowCount: { type: DataTypes.INTEGER, allowNull: false, field: 'row_count' },
      storageKey: { type: DataTypes.STRING(255), allowNull: false, field: 'storage_key' },
      status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'preview' },
      importedById: { type: DataTypes.INTEGER, allowNull: true, field: 'imported_by_id' },
      createdCount: { type: DataTypes.INTEGER, allowNull: true, field: 'created_count' },
      overriddenCount: { type: DataTypes.INTEGER, allowNull: true, field: 'overridden_count' },
      skippedCount: { type: DataTypes.INTEGER, allowNull: true, field: 'skipped_count' },
      committedAt: { type: DataTypes.DATE, allowNull: true, field: 'committed_at' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'species_imports', modelName: 'SpeciesImport', updatedAt: false },
  );
  return SpeciesImport;
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { StoredPoint, TemperatureUnit, ValueKind } from '../../lib/schemas/fit-data';

// K(T) measurements of one reaction, with each point's exclusion and its reason.
export class FitDataSet extends Model<InferAttributes<FitDataSet>, InferCreationAttributes<FitDataSet>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare name: string;
  declare equation: string;
  declare temperatureUnit: TemperatureUnit;
  declare valueKind: ValueKind;
  declare source: 'csv' | 'paste' | 'grid';
  declare note: string;
  declare points: StoredPoint[];
  declare version: CreationOptional<number>;
  declare createdById: number | null;
  declare updatedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initFitDataSet(sequelize: Sequelize): typeof FitDataSet {
  FitDataSet.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      name: { type: DataTypes.STRING(160), allowNull: false },
      equation: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
      temperatureUnit: { type: DataTypes.STRING(8), allowNull: false, field: 'temperature_unit' },
      valueKind: { type: DataTypes.STRING(8), allowNull: false, field: 'value_kind' },
      source: { type: DataTypes.STRING(8), allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      points: { type: DataTypes.JSON, allowNull: false },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      createdById: { type: DataTypes.INTEGER, allowNull: true, field: 'created_by_id' },
      updatedById: { type: DataTypes.INTEGER, allowNull: true, field: 'updated_by_id' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'fit_data_sets', modelName: 'FitDataSet' },
  );
  return FitDataSet;
}

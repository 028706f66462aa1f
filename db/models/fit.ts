import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { FitResult } from '../../lib/fits/analyse-fit';
import type { StoredPoint, TemperatureUnit, ValueKind } from '../../lib/schemas/fit-data';

export interface FitRawData {
  dataSetName: string;
  temperatureUnit: TemperatureUnit;
  valueKind: ValueKind;
  note: string;
  points: StoredPoint[];
}

// A saved van 't Hoff fit: its result and the raw data it came from, as they were. Never edited.
export class Fit extends Model<InferAttributes<Fit>, InferCreationAttributes<Fit>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare dataSetId: number | null;
  declare name: string;
  declare equation: string;
  declare rawData: FitRawData;
  declare result: FitResult;
  declare deltaH0Kj: number;
  declare deltaS0JPerK: number;
  declare createdById: number | null;
  declare createdAt: CreationOptional<Date>;
}

export function initFit(sequelize: Sequelize): typeof Fit {
  Fit.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      dataSetId: { type: DataTypes.INTEGER, allowNull: true, field: 'data_set_id' },
      name: { type: DataTypes.STRING(160), allowNull: false },
      equation: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
      rawData: { type: DataTypes.JSON, allowNull: false, field: 'raw_data' },
      result: { type: DataTypes.JSON, allowNull: false },
      deltaH0Kj: { type: DataTypes.FLOAT, allowNull: false, field: 'delta_h0_kj' },
      deltaS0JPerK: { type: DataTypes.FLOAT, allowNull: false, field: 'delta_s0_j_per_k' },
      createdById: { type: DataTypes.INTEGER, allowNull: true, field: 'created_by_id' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'fits', modelName: 'Fit', updatedAt: false },
  );
  return Fit;
}

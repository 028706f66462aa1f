import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Route extends Model<InferAttributes<Route>, InferCreationAttributes<Route>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare name: string;
  declare target: string;
  declare targetAmount: CreationOptional<string>;
  declare status: CreationOptional<string>;
  declare version: CreationOptional<number>;
  declare marginalThresholdKj: CreationOptional<number>;
  declare originRouteId: CreationOptional<number | null>;
  declare createdById: number;
  declare updatedById: number;
  declare archivedAt: CreationOptional<Date | null>;
  declare deletedAt: CreationOptional<Date | null>;
  declare deletedById: CreationOptional<number | null>;
  declare stepCount: CreationOptional<number>;
  declare overallDgKj: CreationOptional<number | null>;
  declare uphillSteps: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initRoute(sequelize: Sequelize): typeof Route {
  Route.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      name: { type: DataTypes.STRING(160), allowNull: false },
      target: { type: DataTypes.STRING(120), allowNull: false },
      targetAmount: { type: DataTypes.STRING(64), allowNull: false, defaultValue: '1 mol', field: 'target_amount' },
      status: { type: DataTypes.STRING(24), allowNull: false, defaultValue: 'draft' },
      version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
      marginalThresholdKj: { type: DataTypes.FLOAT, allowNull: false, defaultValue: -17, field: 'marginal_threshold_kj' },
      originRouteId: { type: DataTypes.INTEGER, allowNull: true, field: 'origin_route_id' },
      createdById: { type: DataTypes.INTEGER, allowNull: false, field: 'created_by_id' },
      updatedById: { type: DataTypes.INTEGER, allowNull: false, field: 'updated_by_id' },
      archivedAt: { type: DataTypes.DATE, allowNull: true, field: 'archived_at' },
      deletedAt: { type: DataTypes.DATE, allowNull: true, field: 'deleted_at' },
      deletedById: { type: DataTypes.INTEGER, allowNull: true, field: 'deleted_by_id' },
      stepCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0, field: 'step_count' },
      overallDgKj: { type: DataTypes.FLOAT, allowNull: true, field: 'overall_dg_kj' },
      uphillSteps: { type: DataTypes.INTEGER, allowNull: true, field: 'uphill_steps' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'routes', modelName: 'Route' },
  );
  return Route;
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// One saved state of a route: the whole document as JSON text plus the ΔG values of that save.
export class RouteRevision extends Model<InferAttributes<RouteRevision>, InferCreationAttributes<RouteRevision>> {
  declare id: CreationOptional<number>;
  declare routeId: number;
  declare teamId: number;
  declare version: number;
  declare authorId: number | null;
  declare summary: string;
  declare snapshot: string;
  /** ΔG per mol of reaction as written, by step key; null where the step could not be evaluated */
  declare stepDg: Record<string, number | null>;
  declare overallDgKj: number | null;
  declare restoredFromId: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
}

export function initRouteRevision(sequelize: Sequelize): typeof RouteRevision {
  RouteRevision.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      routeId: { type: DataTypes.INTEGER, allowNull: false, field: 'route_id' },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      version: { type: DataTypes.INTEGER, allowNull: false },
      authorId: { type: DataTypes.INTEGER, allowNull: true, field: 'author_id' },
      summary: { type: DataTypes.STRING(300), allowNull: false },
      snapshot: { type: DataTypes.TEXT, allowNull: false },
      stepDg: { type: DataTypes.JSON, allowNull: false, field: 'step_dg' },
      overallDgKj: { type: DataTypes.FLOAT, allowNull: true, field: 'overall_dg_kj' },
      restoredFromId: { type: DataTypes.INTEGER, allowNull: true, field: 'restored_from_id' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'route_revisions', modelName: 'RouteRevision', updatedAt: false },
  );
  return RouteRevision;
}

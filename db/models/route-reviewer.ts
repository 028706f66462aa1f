import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// A reviewer named when a route was sent for review (one row per person per submission).
export class RouteReviewer extends Model<InferAttributes<RouteReviewer>, InferCreationAttributes<RouteReviewer>> {
  declare id: CreationOptional<number>;
  declare routeId: number;
  declare transitionId: number;
  declare userId: number;
  declare createdAt: CreationOptional<Date>;
}

export function initRouteReviewer(sequelize: Sequelize): typeof RouteReviewer {
  RouteReviewer.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      routeId: { type: DataTypes.INTEGER, allowNull: false, field: 'route_id' },
      transitionId: { type: DataTypes.INTEGER, allowNull: false, field: 'transition_id' },
      userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'route_reviewers', modelName: 'RouteReviewer', updatedAt: false },
  );
  return RouteReviewer;
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// One move of a route's review status, with who made it and why.
export class RouteTransition extends Model<InferAttributes<RouteTransition>, InferCreationAttributes<RouteTransition>> {
  declare id: CreationOptional<number>;
  declare routeId: number;
  declare teamId: number;
  declare fromStatus: string;
  declare toStatus: string;
  declare actorId: number | null;
  declare note: CreationOptional<string>;
  /** the route's version after the move */
  declare routeVersion: number;
  declare createdAt: CreationOptional<Date>;
}

export function initRouteTransition(sequelize: Sequelize): typeof RouteTransition {
  RouteTransition.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      routeId: { type: DataTypes.INTEGER, allowNull: false, field: 'route_id' },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      fromStatus: { type: DataTypes.STRING(24), allowNull: false, field: 'from_status' },
      toStatus: { type: DataTypes.STRING(24), allowNull: false, field: 'to_status' },
      actorId: { type: DataTypes.INTEGER, allowNull: true, field: 'actor_id' },
      note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      routeVersion: { type: DataTypes.INTEGER, allowNull: false, field: 'route_version' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'route_transitions', modelName: 'RouteTransition', updatedAt: false },
  );
  return RouteTransition;
}

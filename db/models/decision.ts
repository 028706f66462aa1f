import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ComparisonSnapshot } from '../../lib/compare/compare-types';

// A recorded choice between compared routes, with the comparison as it stood. Never updated except to mark it superseded.
export class Decision extends Model<InferAttributes<Decision>, InferCreationAttributes<Decision>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare chosenRouteId: number | null;
  declare routeIds: number[];
  declare shelvedRouteIds: number[];
  declare rationale: string;
  declare snapshot: ComparisonSnapshot;
  declare authorId: number | null;
  declare supersededById: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
}

export function initDecision(sequelize: Sequelize): typeof Decision {
  Decision.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      chosenRouteId: { type: DataTypes.INTEGER, allowNull: true, field: 'chosen_route_id' },
      routeIds: { type: DataTypes.JSON, allowNull: false, field: 'route_ids' },
      shelvedRouteIds: { type: DataTypes.JSON, allowNull: false, field: 'shelved_route_ids' },
      rationale: { type: DataTypes.TEXT, allowNull: false },
      snapshot: { type: DataTypes.JSON, allowNull: false },
      authorId: { type: DataTypes.INTEGER, allowNull: true, field: 'author_id' },
      supersededById: { type: DataTypes.INTEGER, allowNull: true, field: 'superseded_by_id' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'decisions', modelName: 'Decision', updatedAt: false },
  );
  return Decision;
}

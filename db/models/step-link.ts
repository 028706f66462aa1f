import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// Joins a product of one step (by step key) to a reactant of another.
export class StepLink extends Model<InferAttributes<StepLink>, InferCreationAttributes<StepLink>> {
  declare id: CreationOptional<number>;
  declare routeId: number;
  declare fromKey: string;
  declare toKey: string;
  declare species: string;
  declare createdAt: CreationOptional<Date>;
}

export function initStepLink(sequelize: Sequelize): typeof StepLink {
  StepLink.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      routeId: { type: DataTypes.INTEGER, allowNull: false, field: 'route_id' },
      fromKey: { type: DataTypes.STRING(64), allowNull: false, field: 'from_key' },
      toKey: { type: DataTypes.STRING(64), allowNull: false, field: 'to_key' },
      species: { type: DataTypes.STRING(120), allowNull: false },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'step_links', modelName: 'StepLink', updatedAt: false },
  );
  return StepLink;
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { FlagCategory } from '../../lib/schemas/flag';

export class StepFlag extends Model<InferAttributes<StepFlag>, InferCreationAttributes<StepFlag>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare routeId: number;
  declare stepKey: string;
  declare category: FlagCategory;
  declare reason: string;
  declare createdById: number | null;
  declare clearedAt: CreationOptional<Date | null>;
  declare clearedById: CreationOptional<number | null>;
  declare clearCommentId: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initStepFlag(sequelize: Sequelize): typeof StepFlag {
  StepFlag.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      routeId: { type: DataTypes.INTEGER, allowNull: false, field: 'route_id' },
      stepKey: { type: DataTypes.STRING(64), allowNull: false, field: 'step_key' },
      category: { type: DataTypes.STRING(24), allowNull: false },
      reason: { type: DataTypes.TEXT, allowNull: false },
      createdById: { type: DataTypes.INTEGER, allowNull: true, field: 'created_by_id' },
      clearedAt: { type: DataTypes.DATE, allowNull: true, field: 'cleared_at' },
      clearedById: { type: DataTypes.INTEGER, allowNull: true, field: 'cleared_by_id' },
      clearCommentId: { type: DataTypes.INTEGER, allowNull: true, field: 'clear_comment_id' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'step_flags', modelName: 'StepFlag' },
  );
  return StepFlag;
}

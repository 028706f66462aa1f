import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

// A strongly downhill reaction a team offers as a coupling partner for uphill steps.
export class DriverReaction extends Model<InferAttributes<DriverReaction>, InferCreationAttributes<DriverReaction>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare name: string;
  declare equation: string;
  declare basis: CreationOptional<string>;
  declare createdById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initDriverReaction(sequelize: Sequelize): typeof DriverReaction {
  DriverReaction.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      name: { type: DataTypes.STRING(160), allowNull: false },
      equation: { type: DataTypes.STRING(500), allowNull: false },
      basis: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      createdById: { type: DataTypes.INTEGER, allowNull: true, field: 'created_by_id' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'driver_reactions', modelName: 'DriverReaction' },
  );
  return DriverReaction;
}

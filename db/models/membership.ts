import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '../../lib/auth/roles';

export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare userId: number;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initMembership(sequelize: Sequelize): typeof Membership {
  Membership.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
      role: { type: DataTypes.STRING(16), allowNull: false },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'memberships', modelName: 'Membership' },
  );
  return Membership;
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '../../lib/auth/roles';

export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare invitedById: number;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initInvitation(sequelize: Sequelize): typeof Invitation {
  Invitation.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.STRING(16), allowNull: false },
      tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true, field: 'token_hash' },
      invitedById: { type: DataTypes.INTEGER, allowNull: false, field: 'invited_by_id' },
      expiresAt: { type: DataTypes.DATE, allowNull: false, field: 'expires_at' },
      acceptedAt: { type: DataTypes.DATE, allowNull: true, field: 'accepted_at' },
      revokedAt: { type: DataTypes.DATE, allowNull: true, field: 'revoked_at' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'invitations', modelName: 'Invitation' },
  );
  return Invitation;
}

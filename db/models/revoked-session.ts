import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A session ended by signing out: its JWTs (matched by their `sid` claim) are refused until `expiresAt`. */
export class RevokedSession extends Model<InferAttributes<RevokedSession>, InferCreationAttributes<RevokedSession>> {
  declare sessionId: string;
  declare userId: number;
  declare expiresAt: Date;
  declare createdAt: CreationOptional<Date>;
}

export function initRevokedSession(sequelize: Sequelize): typeof RevokedSession {
  RevokedSession.init(
    {
      sessionId: { type: DataTypes.STRING(64), allowNull: false, primaryKey: true, field: 'session_id' },
      userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
      expiresAt: { type: DataTypes.DATE, allowNull: false, field: 'expires_at' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'revoked_sessions', modelName: 'RevokedSession', updatedAt: false },
  );
  return RevokedSession;
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<number>;
  declare teamId: number | null;
  declare actorId: number | null;
  declare action: string;
  declare targetType: string | null;
  declare targetId: string | null;
  declare data: Record<string, unknown> | null;
  declare createdAt: CreationOptional<Date>;
}

export function initAuditEvent(sequelize: Sequelize): typeof AuditEvent {
  AuditEvent.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: true, field: 'team_id' },
      actorId: { type: DataTypes.INTEGER, allowNull: true, field: 'actor_id' },
      action: { type: DataTypes.STRING(64), allowNull: false },
      targetType: { type: DataTypes.STRING(32), allowNull: true, field: 'target_type' },
      targetId: { type: DataTypes.STRING(64), allowNull: true, field: 'target_id' },
      data: { type: DataTypes.JSON, allowNull: true },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'audit_events', modelName: 'AuditEvent', updatedAt: false },
  );
  return AuditEvent;
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { NotificationKind } from '../../lib/schemas/notification';

export class Notification extends Model<InferAttributes<Notification>, InferCreationAttributes<Notification>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare teamId: number;
  declare kind: NotificationKind;
  declare routeId: number | null;
  declare stepKey: string | null;
  declare actorId: number | null;
  declare title: string;
  declare text: string;
  declare link: string;
  declare readAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
}

export function initNotification(sequelize: Sequelize): typeof Notification {
  Notification.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      userId: { type: DataTypes.INTEGER, allowNull: false, field: 'user_id' },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      kind: { type: DataTypes.STRING(32), allowNull: false },
      routeId: { type: DataTypes.INTEGER, allowNull: true, field: 'route_id' },
      stepKey: { type: DataTypes.STRING(64), allowNull: true, field: 'step_key' },
      actorId: { type: DataTypes.INTEGER, allowNull: true, field: 'actor_id' },
      title: { type: DataTypes.STRING(300), allowNull: false },
      text: { type: DataTypes.TEXT, allowNull: false },
      link: { type: DataTypes.STRING(300), allowNull: false },
      readAt: { type: DataTypes.DATE, allowNull: true, field: 'read_at' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
    },
    { sequelize, tableName: 'notifications', modelName: 'Notification', updatedAt: false },
  );
  return Notification;
}

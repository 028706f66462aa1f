import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A resolved `@handle` as stored on the comment: the member it named at the time of writing. */
export interface StoredMention {
  userId: number;
  handle: string;
}

export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<number>;
  declare teamId: number;
  declare routeId: number;
  declare stepKey: string | null;
  declare parentId: number | null;
  declare authorId: number | null;
  declare body: string;
  declare mentions: StoredMention[];
  declare routeVersion: number;
  declare stepFingerprint: string | null;
  declare resolvedAt: CreationOptional<Date | null>;
  declare resolvedById: CreationOptional<number | null>;
  declare editedAt: CreationOptional<Date | null>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initComment(sequelize: Sequelize): typeof Comment {
  Comment.init(
    {
      id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
      teamId: { type: DataTypes.INTEGER, allowNull: false, field: 'team_id' },
      routeId: { type: DataTypes.INTEGER, allowNull: false, field: 'route_id' },
      stepKey: { type: DataTypes.STRING(64), allowNull: true, field: 'step_key' },
      parentId: { type: DataTypes.INTEGER, allowNull: true, field: 'parent_id' },
      authorId: { type: DataTypes.INTEGER, allowNull: true, field: 'author_id' },
      body: { type: DataTypes.TEXT, allowNull: false },
      mentions: { type: DataTypes.JSON, allowNull: false },
      routeVersion: { type: DataTypes.INTEGER, allowNull: false, field: 'route_version' },
      stepFingerprint: { type: DataTypes.STRING(64), allowNull: true, field: 'step_fingerprint' },
      resolvedAt: { type: DataTypes.DATE, allowNull: true, field: 'resolved_at' },
      resolvedById: { type: DataTypes.INTEGER, allowNull: true, field: 'resolved_by_id' },
      editedAt: { type: DataTypes.DATE, allowNull: true, field: 'edited_at' },
      deletedAt: { type: DataTypes.DATE, allowNull: true, field: 'deleted_at' },
      createdAt: { type: DataTypes.DATE, field: 'created_at' },
      updatedAt: { type: DataTypes.DATE, field: 'updated_at' },
    },
    { sequelize, tableName: 'comments', modelName: 'Comment' },
  );
  return Comment;
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { NotificationType } from '../../shared/types/community';

/**
 * Something a racer is told about in the app: who did what to which setup, revision or comment.
 * Stored as ids and a short detail; the words are composed when it is shown or mailed.
 */
export class Notification extends Model<InferAttributes<Notification>, InferCreationAttributes<Notification>> {
  declare id: CreationOptional<number>;
  /** Who is told. */
  declare userId: number;
  declare type: NotificationType;
  /** Who did it; null for events without one (report outcomes). */
  declare actorId: CreationOptional<number | null>;
  declare setupId: CreationOptional<number | null>;
  declare revisionId: CreationOptional<number | null>;
  declare commentId: CreationOptional<number | null>;
  declare detail: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare readAt: CreationOptional<Date | null>;

  static initModel(sequelize: Sequelize): typeof Notification {
    return Notification.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        type: { type: DataTypes.STRING(30), allowNull: false },
        actorId: { type: DataTypes.INTEGER, allowNull: true },
        setupId: { type: DataTypes.INTEGER, allowNull: true },
        revisionId: { type: DataTypes.INTEGER, allowNull: true },
        commentId: { type: DataTypes.INTEGER, allowNull: true },
        detail: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        readAt: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, tableName: 'notifications', underscored: true, updatedAt: false },
    );
  }
}

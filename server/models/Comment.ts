import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { SetupRevision } from './SetupRevision';
import type { User } from './User';

/**
 * A racer's comment on a setup, optionally on one of its changes (revision) and one field of that
 * change. Replies go one level deep. Deleting is soft so a thread keeps its shape.
 */
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<number>;
  declare setupId: number;
  declare revisionId: CreationOptional<number | null>;
  declare fieldKey: CreationOptional<string | null>;
  /** The top-level comment this one answers; null for a top-level comment. */
  declare parentId: CreationOptional<number | null>;
  declare authorId: number;
  declare bodyMd: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** When the author last changed the body; null when never edited. */
  declare editedAt: CreationOptional<Date | null>;
  declare deletedAt: CreationOptional<Date | null>;
  /** Set by moderation: only the author and moderators still see it. */
  declare hiddenAt: CreationOptional<Date | null>;
  declare author?: NonAttribute<User>;
  declare revision?: NonAttribute<SetupRevision | null>;

  static initModel(sequelize: Sequelize): typeof Comment {
    return Comment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        setupId: { type: DataTypes.INTEGER, allowNull: false },
        revisionId: { type: DataTypes.INTEGER, allowNull: true },
        fieldKey: { type: DataTypes.STRING(80), allowNull: true },
        parentId: { type: DataTypes.INTEGER, allowNull: true },
        authorId: { type: DataTypes.INTEGER, allowNull: false },
        bodyMd: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
        editedAt: { type: DataTypes.DATE, allowNull: true },
        deletedAt: { type: DataTypes.DATE, allowNull: true },
        hiddenAt: { type: DataTypes.DATE, allowNull: true },
      },
      { sequelize, tableName: 'comments', underscored: true },
    );
  }
}

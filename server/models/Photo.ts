import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * An uploaded photo: two re-encoded variants in blob storage (display and thumbnail). The
 * storage keys are random, so URLs built from them cannot be enumerated; `id` stays internal.
 */
export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  /** Key of the display variant (longest side at most 1600 px). */
  declare storageKey: string;
  /** Key of the thumbnail variant (longest side at most 400 px). */
  declare thumbKey: string;
  /** Content type of both variants (they are encoded alike). */
  declare contentType: string;
  /** Width, height and size in bytes of the display variant. */
  declare width: number;
  declare height: number;
  declare bytes: number;
  declare caption: CreationOptional<string>;
  /** Set by moderation: the photo is no longer served. */
  declare hiddenAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Photo {
    return Photo.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        ownerId: { type: DataTypes.INTEGER, allowNull: false },
        storageKey: { type: DataTypes.STRING(200), allowNull: false, unique: true },
        thumbKey: { type: DataTypes.STRING(200), allowNull: false, unique: true },
        contentType: { type: DataTypes.STRING(40), allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        bytes: { type: DataTypes.INTEGER, allowNull: false },
        caption: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
        hiddenAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'photos', underscored: true },
    );
  }
}

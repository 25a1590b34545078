import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { TrackTypeKey } from '../../shared/types/trackTypes';

export class Track extends Model<InferAttributes<Track>, InferCreationAttributes<Track>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare name: string;
  declare surface: TrackTypeKey;
  declare indoor: CreationOptional<boolean>;
  declare notes: CreationOptional<string>;
  /** The racer who added the track; null for seeded tracks. */
  declare createdBy: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Track {
    return Track.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        surface: { type: DataTypes.STRING(40), allowNull: false },
        indoor: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tracks', underscored: true },
    );
  }
}

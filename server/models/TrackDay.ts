import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { TrackDayConditions } from '../../shared/types/trackdays';
import type { Run } from './Run';
import type { Track } from './Track';

/** A racer's day at a track: when, where, the conditions, and the runs. Private to its owner. */
export class TrackDay extends Model<InferAttributes<TrackDay>, InferCreationAttributes<TrackDay>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare trackId: number;
  /** YYYY-MM-DD, the racer's local day. */
  declare date: string;
  declare airTempC: CreationOptional<number | null>;
  declare trackTempC: CreationOptional<number | null>;
  declare humidityPct: CreationOptional<number | null>;
  declare moisture: CreationOptional<TrackDayConditions['moisture']>;
  declare grip: CreationOptional<TrackDayConditions['grip']>;
  declare notes: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare track?: NonAttribute<Track>;
  declare runs?: NonAttribute<Run[]>;

  static initModel(sequelize: Sequelize): typeof TrackDay {
    return TrackDay.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        ownerId: { type: DataTypes.INTEGER, allowNull: false },
        trackId: { type: DataTypes.INTEGER, allowNull: false },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        airTempC: { type: DataTypes.DOUBLE, allowNull: true },
        trackTempC: { type: DataTypes.DOUBLE, allowNull: true },
        humidityPct: { type: DataTypes.DOUBLE, allowNull: true },
        moisture: { type: DataTypes.STRING(10), allowNull: true },
        grip: { type: DataTypes.STRING(10), allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'track_days', underscored: true },
    );
  }
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Car } from './Car';
import type { Setup } from './Setup';
import type { SetupRevision } from './SetupRevision';
import type { TrackDay } from './TrackDay';

/**
 * One run of a track day: the car, the setup and the exact revision it ran (fixed when the run is
 * logged; later edits of the setup make new revisions and never touch it), and its lap times.
 */
export class Run extends Model<InferAttributes<Run>, InferCreationAttributes<Run>> {
  declare id: CreationOptional<number>;
  declare trackDayId: number;
  declare carId: number;
  declare setupId: number;
  declare revisionId: number;
  declare label: CreationOptional<string>;
  /** Lap times in seconds, in the order driven. */
  declare laps: CreationOptional<number[]>;
  /** 0-based lap indexes the racer put back in after the slow-lap rule set them aside. */
  declare includedSlowLaps: CreationOptional<number[]>;
  declare feelNotes: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare trackDay?: NonAttribute<TrackDay>;
  declare car?: NonAttribute<Car>;
  declare setup?: NonAttribute<Setup>;
  declare revision?: NonAttribute<SetupRevision>;

  static initModel(sequelize: Sequelize): typeof Run {
    return Run.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        trackDayId: { type: DataTypes.INTEGER, allowNull: false },
        carId: { type: DataTypes.INTEGER, allowNull: false },
        setupId: { type: DataTypes.INTEGER, allowNull: false },
        revisionId: { type: DataTypes.INTEGER, allowNull: false },
        label: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
        laps: { type: DataTypes.ARRAY(DataTypes.DOUBLE), allowNull: false, defaultValue: [] },
        includedSlowLaps: { type: DataTypes.ARRAY(DataTypes.INTEGER), allowNull: false, defaultValue: [] },
        feelNotes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'runs', underscored: true },
    );
  }
}

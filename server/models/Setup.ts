import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { StoredSetupValues, Visibility } from '../../shared/types/setups';
import type { TrackTypeKey } from '../../shared/types/trackTypes';
import type { VehicleClassKey } from '../../shared/types/vehicleClasses';
import type { Car } from './Car';
import type { User } from './User';

export class Setup extends Model<InferAttributes<Setup>, InferCreationAttributes<Setup>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare carId: number;
  declare vehicleClass: VehicleClassKey;
  declare templateVersion: number;
  declare title: string;
  declare visibility: CreationOptional<Visibility>;
  /** Random token that opens an unlisted setup to whoever has the link. */
  declare shareToken: string;
  declare trackType: CreationOptional<TrackTypeKey | null>;
  declare temperatureC: CreationOptional<number | null>;
  declare grip: CreationOptional<'low' | 'medium' | 'high' | null>;
  declare notesMd: CreationOptional<string>;
  declare currentRevisionId: CreationOptional<number | null>;
  declare revisionCount: CreationOptional<number>;
  declare forkedFromSetupId: CreationOptional<number | null>;
  declare forkedFromRevisionId: CreationOptional<number | null>;
  declare familyRootId: CreationOptional<number | null>;
  /** The original's revision this fork last took values from (fork point or last sync). */
  declare upstreamRevisionId: CreationOptional<number | null>;
  /** Per field, the original's value last taken or dismissed; null until the first sync (the fork point is the base). */
  declare upstreamBaseValues: CreationOptional<StoredSetupValues | null>;
  declare hiddenAt: CreationOptional<Date | null>;
  declare deletedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare car?: NonAttribute<Car>;
  declare owner?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): typeof Setup {
    return Setup.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        ownerId: { type: DataTypes.INTEGER, allowNull: false },
        carId: { type: DataTypes.INTEGER, allowNull: false },
        vehicleClass: { type: DataTypes.STRING(40), allowNull: false },
        templateVersion: { type: DataTypes.INTEGER, allowNull: false },
        title: { type: DataTypes.STRING(120), allowNull: false },
        visibility: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'private' },
        shareToken: { type: DataTypes.STRING(40), allowNull: false },
        trackType: { type: DataTypes.STRING(40), allowNull: true },
        temperatureC: { type: DataTypes.REAL, allowNull: true },
        grip: { type: DataTypes.STRING(10), allowNull: true },
        notesMd: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        currentRevisionId: { type: DataTypes.INTEGER, allowNull: true },
        revisionCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        forkedFromSetupId: { type: DataTypes.INTEGER, allowNull: true },
        forkedFromRevisionId: { type: DataTypes.INTEGER, allowNull: true },
        familyRootId: { type: DataTypes.INTEGER, allowNull: true },
        upstreamRevisionId: { type: DataTypes.INTEGER, allowNull: true },
        upstreamBaseValues: { type: DataTypes.JSONB, allowNull: true },
        hiddenAt: { type: DataTypes.DATE, allowNull: true },
        deletedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'setups', underscored: true },
    );
  }
}

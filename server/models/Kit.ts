import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { StoredSetupValues } from '../../shared/types/setups';
import type { VehicleClassKey } from '../../shared/types/vehicleClasses';
import type { Maker } from './Maker';

export class Kit extends Model<InferAttributes<Kit>, InferCreationAttributes<Kit>> {
  declare id: CreationOptional<number>;
  declare slug: string;
  declare name: string;
  declare makerId: ForeignKey<Maker['id']>;
  declare vehicleClass: VehicleClassKey;
  declare releasedYear: number | null;
  /** The stock sheet: each field's value as the kit comes in the box. */
  declare stockValues: CreationOptional<StoredSetupValues>;
  /** For choice fields, the options that come in the box; other options are option parts. */
  declare stockInBox: CreationOptional<Record<string, string[]>>;
  declare templateVersion: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare maker?: NonAttribute<Maker>;

  static initModel(sequelize: Sequelize): typeof Kit {
    return Kit.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        vehicleClass: { type: DataTypes.STRING(40), allowNull: false },
        releasedYear: { type: DataTypes.INTEGER, allowNull: true },
        stockValues: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        stockInBox: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        templateVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'kits', underscored: true },
    );
  }
}

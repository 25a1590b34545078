import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Kit } from './Kit';

export class Car extends Model<InferAttributes<Car>, InferCreationAttributes<Car>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare kitId: number;
  declare nickname: string;
  /** "No option parts": the car is as it came in the box. */
  declare stock: CreationOptional<boolean>;
  declare photoId: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare kit?: NonAttribute<Kit>;

  static initModel(sequelize: Sequelize): typeof Car {
    return Car.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        ownerId: { type: DataTypes.INTEGER, allowNull: false },
        kitId: { type: DataTypes.INTEGER, allowNull: false },
        nickname: { type: DataTypes.STRING(60), allowNull: false },
        stock: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        photoId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'cars', underscored: true },
    );
  }
}

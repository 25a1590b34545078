import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type Role = 'racer' | 'moderator' | 'admin';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare handle: string;
  declare displayName: string;
  declare role: CreationOptional<Role>;
  declare bio: CreationOptional<string>;
  declare homeTrack: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof User {
    return User.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        handle: { type: DataTypes.STRING(30), allowNull: false },
        displayName: { type: DataTypes.STRING(80), allowNull: false },
        role: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'racer' },
        bio: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        homeTrack: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users', underscored: true },
    );
  }
}

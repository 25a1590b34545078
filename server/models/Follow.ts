import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One racer following another. The pair is the key; the database refuses following yourself. */
export class Follow extends Model<InferAttributes<Follow>, InferCreationAttributes<Follow>> {
  declare followerId: number;
  declare followeeId: number;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof Follow {
    return Follow.init(
      {
        followerId: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
        followeeId: { type: DataTypes.INTEGER, allowNull: false, primaryKey: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'follows', underscored: true, updatedAt: false },
    );
  }
}

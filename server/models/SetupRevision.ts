import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { StoredSetupValues } from '../../shared/types/setups';
import type { User } from './User';

/** One saved state of a setup sheet. Insert-only: the database refuses updates and deletes. */
export class SetupRevision extends Model<InferAttributes<SetupRevision>, InferCreationAttributes<SetupRevision>> {
  declare id: CreationOptional<number>;
  declare setupId: number;
  declare number: number;
  declare values: StoredSetupValues;
  declare changeNote: string;
  declare authorId: number;
  /** How many fields differ from the revision before (0 for revision 1), counted with diffSetupValues when written. */
  declare changedFieldCount: number;
  declare createdAt: CreationOptional<Date>;
  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): typeof SetupRevision {
    return SetupRevision.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        setupId: { type: DataTypes.INTEGER, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        values: { type: DataTypes.JSONB, allowNull: false },
        changeNote: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        authorId: { type: DataTypes.INTEGER, allowNull: false },
        changedFieldCount: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'setup_revisions', underscored: true, updatedAt: false },
    );
  }
}

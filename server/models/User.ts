import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '../../shared/types/auth';
import type { VehicleClassKey } from '../../shared/types/vehicleClasses';

export type { Role };

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare handle: string;
  declare displayName: string;
  declare role: CreationOptional<Role>;
  declare bio: CreationOptional<string>;
  declare homeTrack: CreationOptional<string>;
  declare email: CreationOptional<string | null>;
  declare emailVerifiedAt: CreationOptional<Date | null>;
  declare pendingEmail: CreationOptional<string | null>;
  declare passwordHash: CreationOptional<string | null>;
  declare githubId: CreationOptional<string | null>;
  declare githubLogin: CreationOptional<string | null>;
  declare classesRaced: CreationOptional<VehicleClassKey[]>;
  declare unitsLength: CreationOptional<'mm' | 'in'>;
  declare unitsTemperature: CreationOptional<'C' | 'F'>;
  declare suspendedUntil: CreationOptional<Date | null>;
  declare suspendedIndefinitely: CreationOptional<boolean>;
  declare suspensionReason: CreationOptional<string | null>;
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
        email: { type: DataTypes.STRING(254), allowNull: true },
        emailVerifiedAt: { type: DataTypes.DATE, allowNull: true },
        pendingEmail: { type: DataTypes.STRING(254), allowNull: true },
        passwordHash: { type: DataTypes.STRING(100), allowNull: true },
        githubId: { type: DataTypes.STRING(40), allowNull: true },
        githubLogin: { type: DataTypes.STRING(60), allowNull: true },
        classesRaced: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        unitsLength: { type: DataTypes.STRING(2), allowNull: false, defaultValue: 'mm' },
        unitsTemperature: { type: DataTypes.STRING(1), allowNull: false, defaultValue: 'C' },
        suspendedUntil: { type: DataTypes.DATE, allowNull: true },
        suspendedIndefinitely: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        suspensionReason: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users', underscored: true },
    );
  }

  /** Suspended now: indefinitely, or until a time still in the future. */
  isSuspended(now = new Date()): boolean {
    return this.suspendedIndefinitely || (this.suspendedUntil !== null && this.suspendedUntil > now);
  }
}

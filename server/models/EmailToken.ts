import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type EmailTokenPurpose = 'verify' | 'reset';

export class EmailToken extends Model<InferAttributes<EmailToken>, InferCreationAttributes<EmailToken>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare purpose: EmailTokenPurpose;
  /** SHA-256 hex of the token; the token itself only ever exists in the e-mail. */
  declare tokenHash: string;
  /** The address the token was sent to (for e-mail changes, the new address). */
  declare email: string | null;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof EmailToken {
    return EmailToken.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        purpose: { type: DataTypes.STRING(20), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        email: { type: DataTypes.STRING(254), allowNull: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'email_tokens', underscored: true, updatedAt: false },
    );
  }
}

import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A message the local fake SMTP server received (development and tests only). */
export class MailboxMessage extends Model<InferAttributes<MailboxMessage>, InferCreationAttributes<MailboxMessage>> {
  declare id: CreationOptional<number>;
  declare toAddress: string;
  declare fromAddress: string;
  declare subject: string;
  declare textBody: string;
  declare htmlBody: string;
  declare receivedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): typeof MailboxMessage {
    return MailboxMessage.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        toAddress: { type: DataTypes.TEXT, allowNull: false },
        fromAddress: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        textBody: { type: DataTypes.TEXT, allowNull: false },
        htmlBody: { type: DataTypes.TEXT, allowNull: false },
        receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'mailbox_messages', underscored: true, timestamps: false },
    );
  }
}

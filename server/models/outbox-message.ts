import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A message the installation sent: caught by the local SMTP catcher, or handed to a real relay. */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<number>;
  declare messageId: string | null;
  declare sender: string;
  declare recipients: string;
  declare subject: string;
  declare textBody: string | null;
  declare htmlBody: string | null;
  declare transport: 'catcher' | 'relay';
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    OutboxMessage.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        messageId: { type: DataTypes.STRING(255), allowNull: true },
        sender: { type: DataTypes.STRING(320), allowNull: false },
        recipients: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.STRING(500), allowNull: false },
        textBody: { type: DataTypes.TEXT('medium'), allowNull: true },
        htmlBody: { type: DataTypes.TEXT('medium'), allowNull: true },
        transport: { type: DataTypes.ENUM('catcher', 'relay'), allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'outbox_messages', modelName: 'OutboxMessage', updatedAt: false },
    );
  }
}

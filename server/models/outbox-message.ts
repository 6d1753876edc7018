import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type OutboxAttachment = { filename: string; contentType: string; size: number };

/** A message caught by the local fake SMTP server, shown on the Outbox page. */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<string>;
  declare messageId: string | null;
  declare from: string;
  declare to: string;
  declare subject: string;
  declare text: string;
  declare html: string | null;
  declare attachments: CreationOptional<OutboxAttachment[]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    OutboxMessage.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        messageId: DataTypes.TEXT,
        from: { type: DataTypes.TEXT, allowNull: false },
        to: { type: DataTypes.TEXT, allowNull: false },
        subject: { type: DataTypes.TEXT, allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: DataTypes.TEXT,
        attachments: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'outbox_messages' },
    );
  }
}

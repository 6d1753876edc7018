import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type OutboxAttachment = { filename: string; contentType: string; size: number };

/** A message caught by the local fake SMTP server, shown in its recipients' Outbox. */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<string>;
  declare messageId: string | null;
  declare from: string;
  declare to: string;
  /** The SMTP envelope's recipients in lower case: whose Outbox lists the message. */
  declare recipients: string[];
  declare subject: string;
  declare text: string;
  declare html: string | null;
  declare attachments: CreationOptional<OutboxAttachment[]>;
  /** The message as received (RFC 5322), attachments included. */
  declare raw: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    OutboxMessage.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        messageId: DataTypes.TEXT,
        from: { type: DataTypes.TEXT, allowNull: false },
        to: { type: DataTypes.TEXT, allowNull: false },
        recipients: { type: DataTypes.ARRAY(DataTypes.TEXT), allowNull: false, defaultValue: [] },
        subject: { type: DataTypes.TEXT, allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: DataTypes.TEXT,
        attachments: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        raw: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'outbox_messages' },
    );
  }
}

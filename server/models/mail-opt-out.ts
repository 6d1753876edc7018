import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { MailKind } from '@shared/schemas/mail-settings';

/** A kind of e-mail one person does not want from one studio (every kind is on until they say so). */
export class MailOptOut extends Model<InferAttributes<MailOptOut>, InferCreationAttributes<MailOptOut>> {
  declare userId: string;
  declare studioId: string;
  declare kind: MailKind;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    MailOptOut.init(
      {
        userId: { type: DataTypes.UUID, primaryKey: true },
        studioId: { type: DataTypes.UUID, primaryKey: true },
        kind: { type: DataTypes.TEXT, primaryKey: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'mail_opt_outs', updatedAt: false },
    );
  }
}

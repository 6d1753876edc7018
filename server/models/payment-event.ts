import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A webhook event from the payment provider that was handled: a second delivery of the same id changes nothing. */
export class PaymentEvent extends Model<InferAttributes<PaymentEvent>, InferCreationAttributes<PaymentEvent>> {
  declare id: string;
  declare type: string;
  declare outcome: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PaymentEvent.init(
      {
        id: { type: DataTypes.TEXT, primaryKey: true },
        type: { type: DataTypes.TEXT, allowNull: false },
        outcome: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'payment_events' },
    );
  }
}

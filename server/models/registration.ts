import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { RegistrationStatus } from '@shared/schemas/class';
import type { CraftClass } from './class';

/** One attendee's place in a class: a seat hold, a paid seat, a place on the waiting list, or how it ended. */
export class Registration extends Model<InferAttributes<Registration>, InferCreationAttributes<Registration>> {
  declare id: CreationOptional<string>;
  declare classId: ForeignKey<string>;
  /** Arrival order; the waiting list is offered seats in this order. */
  declare seq: CreationOptional<string>;
  declare userId: ForeignKey<string | null>;
  declare name: string;
  declare email: string;
  declare status: RegistrationStatus;
  /** Why a registration ended without a seat ("declined", "hold expired", "class cancelled" ...). */
  declare endReason: CreationOptional<string | null>;
  declare amountCents: CreationOptional<number>;
  declare currency: string;
  declare holdExpiresAt: CreationOptional<Date | null>;
  declare offeredAt: CreationOptional<Date | null>;
  declare checkoutSessionId: CreationOptional<string | null>;
  declare checkoutUrl: CreationOptional<string | null>;
  /** Counts checkout sessions made for this registration: part of each create call's idempotency key. */
  declare checkoutAttempt: CreationOptional<number>;
  declare paymentIntentId: CreationOptional<string | null>;
  declare paidAt: CreationOptional<Date | null>;
  declare confirmedAt: CreationOptional<Date | null>;
  declare cancelledAt: CreationOptional<Date | null>;
  declare refundId: CreationOptional<string | null>;
  declare refundedAt: CreationOptional<Date | null>;
  declare checkedInAt: CreationOptional<Date | null>;
  declare reminderSentAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare class?: NonAttribute<CraftClass>;

  static initModel(sequelize: Sequelize) {
    Registration.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        seq: { type: DataTypes.BIGINT, autoIncrement: true },
        name: { type: DataTypes.TEXT, allowNull: false },
        email: {
          type: DataTypes.TEXT,
          allowNull: false,
          set(v: string) {
            this.setDataValue('email', v.trim().toLowerCase());
          },
        },
        status: { type: DataTypes.TEXT, allowNull: false },
        endReason: { type: DataTypes.TEXT, allowNull: true },
        amountCents: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        currency: { type: DataTypes.TEXT, allowNull: false },
        holdExpiresAt: { type: DataTypes.DATE, allowNull: true },
        offeredAt: { type: DataTypes.DATE, allowNull: true },
        checkoutSessionId: { type: DataTypes.TEXT, allowNull: true },
        checkoutUrl: { type: DataTypes.TEXT, allowNull: true },
        checkoutAttempt: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        paymentIntentId: { type: DataTypes.TEXT, allowNull: true },
        paidAt: { type: DataTypes.DATE, allowNull: true },
        confirmedAt: { type: DataTypes.DATE, allowNull: true },
        cancelledAt: { type: DataTypes.DATE, allowNull: true },
        refundId: { type: DataTypes.TEXT, allowNull: true },
        refundedAt: { type: DataTypes.DATE, allowNull: true },
        checkedInAt: { type: DataTypes.DATE, allowNull: true },
        reminderSentAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'registrations' },
    );
  }
}

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
import type { User } from './user';

/** How many projects a month a studio expects of one maker (a design team's usual deal). */
export class MonthlyTarget extends Model<InferAttributes<MonthlyTarget>, InferCreationAttributes<MonthlyTarget>> {
  declare id: CreationOptional<string>;
  declare studioId: ForeignKey<string>;
  declare userId: ForeignKey<string>;
  declare perMonth: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare user?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    MonthlyTarget.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        perMonth: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'monthly_targets' },
    );
  }
}

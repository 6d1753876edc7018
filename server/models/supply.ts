import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { SupplyCategory } from '@shared/schemas/supply';

/** One line of the supplies list. */
export class Supply extends Model<InferAttributes<Supply>, InferCreationAttributes<Supply>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare position: CreationOptional<number>;
  declare category: SupplyCategory;
  declare name: string;
  declare quantity: CreationOptional<string>;
  declare note: CreationOptional<string>;
  declare url: CreationOptional<string | null>;
  declare sponsored: CreationOptional<boolean>;
  declare discountCode: CreationOptional<string | null>;
  /** The sheet plan's figure a lower sheet count was accepted against, on purpose; null when none was. */
  declare acceptedSheetNeed: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Supply.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        category: { type: DataTypes.TEXT, allowNull: false },
        name: { type: DataTypes.TEXT, allowNull: false },
        quantity: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        url: DataTypes.TEXT,
        sponsored: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        discountCode: DataTypes.TEXT,
        acceptedSheetNeed: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'supplies' },
    );
  }
}

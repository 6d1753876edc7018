import type { SheetGrain } from '@shared/geometry';
import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A paper or cardstock a tutorial's pieces are cut from, with its stock sheet. */
export class Material extends Model<InferAttributes<Material>, InferCreationAttributes<Material>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare name: string;
  declare kind: CreationOptional<string>;
  declare sheetWidth: string;
  declare sheetHeight: string;
  /** False for directional prints: pieces keep their orientation on the sheet. */
  declare rotate: CreationOptional<boolean>;
  /** Which side of the stock sheet its grain runs along; 'none' when not known. */
  declare grain: CreationOptional<SheetGrain>;
  /** What one stock sheet costs, in minor units of `sheetPriceCurrency` (kit planner). */
  declare sheetPriceCents: CreationOptional<number | null>;
  declare sheetPriceCurrency: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Material.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        name: { type: DataTypes.TEXT, allowNull: false },
        kind: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'cardstock' },
        sheetWidth: { type: DataTypes.TEXT, allowNull: false },
        sheetHeight: { type: DataTypes.TEXT, allowNull: false },
        rotate: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        grain: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'none' },
        sheetPriceCents: { type: DataTypes.INTEGER, allowNull: true },
        sheetPriceCurrency: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'materials' },
    );
  }
}

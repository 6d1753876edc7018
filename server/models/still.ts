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
import type { Recording } from './recording';

/** A frame pulled from a recording, with its caption and alt text. */
export class Still extends Model<InferAttributes<Still>, InferCreationAttributes<Still>> {
  declare id: CreationOptional<string>;
  declare recordingId: ForeignKey<string>;
  declare atMs: number;
  declare requestedMs: number;
  declare mode: 'exact' | 'sharpest';
  declare fileKey: string;
  declare width: number;
  declare height: number;
  declare sharpness: number | null;
  declare caption: CreationOptional<string>;
  declare alt: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare recording?: NonAttribute<Recording>;

  static initModel(sequelize: Sequelize) {
    Still.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        atMs: { type: DataTypes.INTEGER, allowNull: false },
        requestedMs: { type: DataTypes.INTEGER, allowNull: false },
        mode: { type: DataTypes.TEXT, allowNull: false },
        fileKey: { type: DataTypes.TEXT, allowNull: false },
        width: { type: DataTypes.INTEGER, allowNull: false },
        height: { type: DataTypes.INTEGER, allowNull: false },
        sharpness: DataTypes.DOUBLE,
        caption: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        alt: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'stills' },
    );
  }
}

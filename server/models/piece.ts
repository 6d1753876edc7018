import type { Grain, PieceShape } from '@shared/measure';
import type { StoredShapeParams } from '@shared/geometry';
import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A score line as stored: the position is an exact serialized length ("17/4 in"). */
export type StoredScoreLine = { axis: 'width' | 'height'; at: string; tab?: boolean };

/** A shape's own sizes as stored: lengths exact and serialized ("1/4 in"), the rest as they are. */
export type { StoredShapeParams };

/** One row of a tutorial's cut list; lengths are exact serialized rationals, never floats. */
export class PieceRow extends Model<InferAttributes<PieceRow>, InferCreationAttributes<PieceRow>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare position: CreationOptional<number>;
  declare name: string;
  declare material: CreationOptional<string>;
  declare quantity: CreationOptional<number>;
  declare shape: CreationOptional<PieceShape>;
  declare params: CreationOptional<StoredShapeParams>;
  declare grain: CreationOptional<Grain>;
  declare width: string;
  declare height: string;
  declare scoreLines: CreationOptional<StoredScoreLine[]>;
  declare matOnId: CreationOptional<string | null>;
  declare notes: CreationOptional<string>;
  declare saidAtMs: CreationOptional<number | null>;
  /** The transcript mention this piece was made from (see cut-list's mentionKey). */
  declare mentionKey: CreationOptional<string | null>;
  /** The score mentions whose lines were added to this piece. */
  declare scoreMentionKeys: CreationOptional<string[]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    PieceRow.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        name: { type: DataTypes.TEXT, allowNull: false },
        material: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        quantity: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        shape: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'rect' },
        params: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        grain: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'any' },
        width: { type: DataTypes.TEXT, allowNull: false },
        height: { type: DataTypes.TEXT, allowNull: false },
        scoreLines: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        matOnId: { type: DataTypes.UUID, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        saidAtMs: { type: DataTypes.INTEGER, allowNull: true },
        mentionKey: { type: DataTypes.TEXT, allowNull: true },
        scoreMentionKeys: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'pieces' },
    );
  }
}

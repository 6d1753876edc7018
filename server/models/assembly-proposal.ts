import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ACCEPTING, AssemblyKind, AssemblyPayload, AssemblyState } from '@shared/schemas/assembly';

/** One thing "Assemble the tutorial" proposed: a chapter, a still, a piece, a supply or the first draft. */
export class AssemblyProposal extends Model<InferAttributes<AssemblyProposal>, InferCreationAttributes<AssemblyProposal>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare kind: AssemblyKind;
  /** What it proposes, stable across runs (a chapter's time, a mention's key, a supply's name): nothing is proposed twice. */
  declare sourceKey: string;
  declare position: CreationOptional<number>;
  declare payload: AssemblyPayload;
  /** 'accepting' while one request makes it (a claim, so nothing is made twice). */
  declare state: CreationOptional<AssemblyState | typeof ACCEPTING>;
  /** The record accepting made (chapter, still, piece, supply), so undo can take it out. */
  declare madeId: CreationOptional<string | null>;
  /** What undo needs beyond the made record (the write-up before the draft). */
  declare undo: CreationOptional<Record<string, unknown> | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AssemblyProposal.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        kind: { type: DataTypes.TEXT, allowNull: false },
        sourceKey: { type: DataTypes.TEXT, allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        payload: { type: DataTypes.JSONB, allowNull: false },
        state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'proposed' },
        madeId: { type: DataTypes.UUID, allowNull: true },
        undo: { type: DataTypes.JSONB, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'assembly_proposals' },
    );
  }
}

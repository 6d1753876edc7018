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
import type { DocJson } from './article';
import type { User } from './user';

/** A saved state of a write-up to look back at and restore. */
export class Revision extends Model<InferAttributes<Revision>, InferCreationAttributes<Revision>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare version: number;
  declare doc: DocJson;
  declare authorId: ForeignKey<string | null>;
  declare note: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Revision.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        version: { type: DataTypes.INTEGER, allowNull: false },
        doc: { type: DataTypes.JSONB, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'revisions' },
    );
  }
}

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
import type { JSONContent } from '@tiptap/core';
import type { User } from './user';

/** Tiptap JSON as stored (validated against shared/editor's schema before every save). */
export type DocJson = JSONContent;

/** A tutorial's current write-up; `version` goes up by one on every save. */
export class Article extends Model<InferAttributes<Article>, InferCreationAttributes<Article>> {
  declare tutorialId: string;
  declare doc: DocJson;
  declare version: CreationOptional<number>;
  declare updatedById: ForeignKey<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare updatedBy?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Article.init(
      {
        tutorialId: { type: DataTypes.UUID, primaryKey: true },
        doc: { type: DataTypes.JSONB, allowNull: false },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'articles' },
    );
  }
}

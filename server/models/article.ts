import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { User } from './user';

import type { JSONContent } from '@tiptap/core';

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

/** One line of the supplies list. */
export class Supply extends Model<InferAttributes<Supply>, InferCreationAttributes<Supply>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare position: CreationOptional<number>;
  declare category: string;
  declare name: string;
  declare quantity: CreationOptional<string>;
  declare note: CreationOptional<string>;
  declare url: CreationOptional<string | null>;
  declare sponsored: CreationOptional<boolean>;
  declare discountCode: CreationOptional<string | null>;
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
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'supplies' },
    );
  }
}

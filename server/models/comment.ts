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
import type { CommentAnchor } from '@shared/schemas/comment';
import type { User } from './user';

/**
 * A comment on a tutorial, or a reply in a comment's thread. Stored apart from the write-up, so
 * commenting never changes the document's version; the anchor points at a step (and a passage of
 * it), a piece of the cut list or a still, and is checked against them when read.
 */
export class Comment extends Model<InferAttributes<Comment>, InferCreationAttributes<Comment>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare parentId: ForeignKey<string | null>;
  declare authorId: ForeignKey<string | null>;
  declare body: string;
  declare anchor: CreationOptional<CommentAnchor | null>;
  declare anchorLabel: CreationOptional<string | null>;
  declare mentionedIds: CreationOptional<string[]>;
  declare resolvedAt: CreationOptional<Date | null>;
  declare resolvedById: ForeignKey<string | null>;
  declare editedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare author?: NonAttribute<User | null>;
  declare resolvedBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    Comment.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        body: { type: DataTypes.TEXT, allowNull: false },
        anchor: { type: DataTypes.JSONB, allowNull: true },
        anchorLabel: { type: DataTypes.TEXT, allowNull: true },
        mentionedIds: { type: DataTypes.ARRAY(DataTypes.UUID), allowNull: false, defaultValue: [] },
        resolvedAt: { type: DataTypes.DATE, allowNull: true },
        editedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'comments' },
    );
  }
}

import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A transcript mention the maker marked as not a piece. */
export class MentionDismissal extends Model<InferAttributes<MentionDismissal>, InferCreationAttributes<MentionDismissal>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare mentionKey: string;

  static initModel(sequelize: Sequelize) {
    MentionDismissal.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        mentionKey: { type: DataTypes.TEXT, allowNull: false },
      },
      { sequelize, tableName: 'mention_dismissals' },
    );
  }
}

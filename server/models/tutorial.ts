import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { TutorialState } from '@shared/schemas/tutorial';
import type { Studio } from './studio';
import type { User } from './user';

/** One project of a studio (a round gift box, a gatefold card ...). */
export class Tutorial extends Model<InferAttributes<Tutorial>, InferCreationAttributes<Tutorial>> {
  declare id: CreationOptional<string>;
  declare studioId: ForeignKey<string>;
  declare authorId: ForeignKey<string | null>;
  declare title: string;
  declare slug: string;
  declare state: CreationOptional<TutorialState>;
  declare dueDate: CreationOptional<string | null>;
  declare precision: CreationOptional<8 | 16 | 32>;
  declare defaultUnit: CreationOptional<'in' | 'mm' | 'cm'>;
  declare publishedAt: CreationOptional<Date | null>;
  /** The sponsorship disclosure; null means the default wording. */
  declare disclosure: CreationOptional<string | null>;
  /** Where the video is published; used by handouts, QR codes and descriptions. */
  declare videoUrl: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare studio?: NonAttribute<Studio>;
  declare author?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Tutorial.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        title: { type: DataTypes.TEXT, allowNull: false },
        slug: { type: DataTypes.TEXT, allowNull: false },
        state: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'draft' },
        dueDate: { type: DataTypes.DATEONLY, allowNull: true },
        precision: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 16 },
        defaultUnit: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'in' },
        publishedAt: { type: DataTypes.DATE, allowNull: true },
        disclosure: { type: DataTypes.TEXT, allowNull: true },
        videoUrl: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tutorials' },
    );
  }
}

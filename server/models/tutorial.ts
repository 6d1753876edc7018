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
import type { TutorialState, UpdateState } from '@shared/schemas/tutorial';
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
  /** The version readers see (public page, exports, reader's view); null until it is published. */
  declare liveVersionId: CreationOptional<string | null>;
  /** The version a coordinator approved, which publishing makes live; null when nothing is approved. */
  declare approvedVersionId: CreationOptional<string | null>;
  /** The review state of the changes made since publishing; null when there are none. */
  declare updateState: CreationOptional<UpdateState | null>;
  /** The brief it was started from (briefs are the board's assignments). */
  declare briefId: ForeignKey<string | null>;
  /** A scheduled publish: when, the zone it was picked in, who set it and the queue job that will do it. */
  declare publishAt: CreationOptional<Date | null>;
  declare publishTimeZone: CreationOptional<string | null>;
  declare publishScheduledById: ForeignKey<string | null>;
  declare publishJobId: CreationOptional<string | null>;
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
        liveVersionId: { type: DataTypes.UUID, allowNull: true },
        approvedVersionId: { type: DataTypes.UUID, allowNull: true },
        updateState: { type: DataTypes.TEXT, allowNull: true },
        publishAt: { type: DataTypes.DATE, allowNull: true },
        publishTimeZone: { type: DataTypes.TEXT, allowNull: true },
        publishJobId: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tutorials' },
    );
  }
}

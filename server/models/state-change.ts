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
import type { TutorialState } from '@shared/schemas/tutorial';
import type { OpenCommentDto } from '@shared/schemas/review';
import type { User } from './user';

/** One move of a tutorial between review states: who, when, from, to, and their note. Never changed after. */
export class StateChange extends Model<InferAttributes<StateChange>, InferCreationAttributes<StateChange>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  /** Null when the app made the move itself (a scheduled publish). */
  declare byId: ForeignKey<string | null>;
  declare action: string;
  declare fromState: TutorialState;
  declare toState: TutorialState;
  declare note: CreationOptional<string>;
  /** The comments still open when it was sent back. */
  declare openComments: CreationOptional<OpenCommentDto[]>;
  /** A move of a published tutorial's update (DESIGN.md T4): from and to are the update's states. */
  declare ofUpdate: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare by?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    StateChange.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        action: { type: DataTypes.TEXT, allowNull: false },
        fromState: { type: DataTypes.TEXT, allowNull: false },
        toState: { type: DataTypes.TEXT, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        openComments: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        ofUpdate: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'state_changes', updatedAt: false },
    );
  }
}

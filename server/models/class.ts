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
import type { ClassStatus } from '@shared/schemas/class';
import type { Paper } from '@shared/schemas/publish';
import type { Studio } from './studio';
import type { Tutorial } from './tutorial';

/** A class taught from a tutorial: when, where, how many seats and the kit fee (integer minor units). */
export class CraftClass extends Model<InferAttributes<CraftClass>, InferCreationAttributes<CraftClass>> {
  declare id: CreationOptional<string>;
  declare studioId: ForeignKey<string>;
  declare tutorialId: ForeignKey<string>;
  declare createdById: ForeignKey<string | null>;
  declare title: string;
  declare startsAt: Date;
  /** IANA time zone the class is shown in (e-mails, the public page). */
  declare timeZone: CreationOptional<string>;
  declare durationMinutes: number;
  declare place: string;
  declare seats: number;
  /** Extra kits cut for mistakes (kit planner). */
  declare spares: CreationOptional<number>;
  declare kitFeeCents: number;
  declare currency: string;
  declare whatToBring: CreationOptional<string>;
  declare cancellationDeadline: CreationOptional<Date | null>;
  /** The teacher's own safety wording, one caution a line; null means the default wording. */
  declare cautions: CreationOptional<string | null>;
  declare paper: CreationOptional<Paper>;
  declare status: CreationOptional<ClassStatus>;
  declare cancelledAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare studio?: NonAttribute<Studio>;
  declare tutorial?: NonAttribute<Tutorial>;

  static initModel(sequelize: Sequelize) {
    CraftClass.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        title: { type: DataTypes.TEXT, allowNull: false },
        startsAt: { type: DataTypes.DATE, allowNull: false },
        timeZone: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'UTC' },
        durationMinutes: { type: DataTypes.INTEGER, allowNull: false },
        place: { type: DataTypes.TEXT, allowNull: false },
        seats: { type: DataTypes.INTEGER, allowNull: false },
        spares: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        kitFeeCents: { type: DataTypes.INTEGER, allowNull: false },
        currency: { type: DataTypes.TEXT, allowNull: false },
        whatToBring: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        cancellationDeadline: { type: DataTypes.DATE, allowNull: true },
        cautions: { type: DataTypes.TEXT, allowNull: true },
        paper: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'letter' },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'scheduled' },
        cancelledAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'classes' },
    );
  }
}

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
import type { Tutorial } from './tutorial';
import type { User } from './user';

/** A coordinator's assignment to a maker: what to make, what to feature, by when (DESIGN.md T3). */
export class Brief extends Model<InferAttributes<Brief>, InferCreationAttributes<Brief>> {
  declare id: CreationOptional<string>;
  declare studioId: ForeignKey<string>;
  declare makerId: ForeignKey<string>;
  declare createdById: ForeignKey<string | null>;
  declare title: string;
  declare dueDate: string;
  /** Products or papers to feature, one an entry. */
  declare features: CreationOptional<string[]>;
  declare notes: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare maker?: NonAttribute<User>;
  declare createdBy?: NonAttribute<User>;
  /** The tutorial started from it (tutorials.brief_id), if any. */
  declare tutorial?: NonAttribute<Tutorial | null>;

  static initModel(sequelize: Sequelize) {
    Brief.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        title: { type: DataTypes.TEXT, allowNull: false },
        dueDate: { type: DataTypes.DATEONLY, allowNull: false },
        features: { type: DataTypes.JSONB, allowNull: false, defaultValue: [] },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'briefs' },
    );
  }
}

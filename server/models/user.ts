import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Membership } from './membership';

/** A person who signs in; one account across studios. */
export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  /** The person's roles, loaded with them on each request (`loadUser`), so access checks need no query of their own. */
  declare memberships?: NonAttribute<Membership[]>;

  /** The public face of a person: never the hash. */
  toPublic() {
    return { id: this.id, email: this.email, name: this.name };
  }

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        email: {
          type: DataTypes.TEXT,
          allowNull: false,
          unique: true,
          set(v: string) {
            this.setDataValue('email', v.trim().toLowerCase());
          },
        },
        name: { type: DataTypes.TEXT, allowNull: false },
        passwordHash: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users' },
    );
  }
}

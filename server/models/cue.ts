import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One timed line of a recording's transcript. */
export class Cue extends Model<InferAttributes<Cue>, InferCreationAttributes<Cue>> {
  declare id: CreationOptional<string>;
  declare recordingId: ForeignKey<string>;
  declare position: number;
  declare startMs: number;
  declare endMs: number;
  declare text: string;
  declare identifier: string | null;

  static initModel(sequelize: Sequelize) {
    Cue.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        position: { type: DataTypes.INTEGER, allowNull: false },
        startMs: { type: DataTypes.INTEGER, allowNull: false },
        endMs: { type: DataTypes.INTEGER, allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        identifier: DataTypes.TEXT,
      },
      { sequelize, tableName: 'cues', timestamps: false },
    );
  }
}

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
import type { RecordingStatus } from '@shared/schemas/footage';
import type { Tutorial } from './tutorial';

export type { RecordingStatus };
export type ThumbnailInfo = { keys: string[]; atMs: number[]; columns: number; rows: number; perSheet: number; tileWidth: number; tileHeight: number };

/** An uploaded video of a tutorial, with what ffprobe found and the files made from it. */
export class Recording extends Model<InferAttributes<Recording>, InferCreationAttributes<Recording>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare uploadedById: ForeignKey<string | null>;
  declare originalName: string;
  declare mime: string;
  declare sizeBytes: number;
  declare sourceKey: string;
  declare status: CreationOptional<RecordingStatus>;
  declare progress: CreationOptional<number>;
  declare stage: CreationOptional<string | null>;
  declare error: CreationOptional<string | null>;
  declare durationMs: CreationOptional<number | null>;
  declare width: CreationOptional<number | null>;
  declare height: CreationOptional<number | null>;
  declare frameRate: CreationOptional<number | null>;
  declare videoCodec: CreationOptional<string | null>;
  declare audioCodec: CreationOptional<string | null>;
  declare hasAudio: CreationOptional<boolean | null>;
  declare previewKey: CreationOptional<string | null>;
  declare posterKey: CreationOptional<string | null>;
  declare thumbnails: CreationOptional<ThumbnailInfo | null>;
  /** Set every few seconds while a worker processes the recording; an old one means the worker died. */
  declare leaseUntil: CreationOptional<Date | null>;
  declare transcriptName: CreationOptional<string | null>;
  declare transcriptFormat: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare tutorial?: NonAttribute<Tutorial>;

  static initModel(sequelize: Sequelize) {
    Recording.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        originalName: { type: DataTypes.TEXT, allowNull: false },
        mime: { type: DataTypes.TEXT, allowNull: false },
        // BIGINT comes back from pg as a string; files of several GB still fit a JS number exactly.
        sizeBytes: {
          type: DataTypes.BIGINT,
          allowNull: false,
          get() {
            return Number(this.getDataValue('sizeBytes'));
          },
        },
        sourceKey: { type: DataTypes.TEXT, allowNull: false },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'uploaded' },
        progress: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        stage: DataTypes.TEXT,
        error: DataTypes.TEXT,
        durationMs: DataTypes.INTEGER,
        width: DataTypes.INTEGER,
        height: DataTypes.INTEGER,
        frameRate: DataTypes.DOUBLE,
        videoCodec: DataTypes.TEXT,
        audioCodec: DataTypes.TEXT,
        hasAudio: DataTypes.BOOLEAN,
        previewKey: DataTypes.TEXT,
        posterKey: DataTypes.TEXT,
        thumbnails: DataTypes.JSONB,
        leaseUntil: { type: DataTypes.DATE, allowNull: true },
        transcriptName: DataTypes.TEXT,
        transcriptFormat: DataTypes.TEXT,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'recordings' },
    );
  }
}

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
import type { Grain, PieceShape } from '@shared/measure';
import type { SheetGrain } from '@shared/geometry';
import type { SupplyCategory } from '@shared/schemas/supply';
import type { DocJson } from './article';
import type { StoredScoreLine, StoredShapeParams } from './piece';
import type { User } from './user';

/** A piece as kept in a version: the stored row's own fields (lengths exact and serialized, "17/4 in"). */
export type VersionPiece = {
  id: string;
  name: string;
  material: string;
  quantity: number;
  shape: PieceShape;
  params: StoredShapeParams;
  grain: Grain;
  width: string;
  height: string;
  scoreLines: StoredScoreLine[];
  matOnId: string | null;
  notes: string;
};

/** A material (stock sheet) as kept in a version: what the cut list's checks read. */
export type VersionMaterial = { id: string; name: string; kind: string; sheetWidth: string; sheetHeight: string; rotate: boolean; grain: SheetGrain };

/** A supply as kept in a version. */
export type VersionSupply = {
  id: string;
  category: SupplyCategory;
  name: string;
  quantity: string;
  note: string;
  url: string | null;
  sponsored: boolean;
  discountCode: string | null;
};

/** A still as kept in a version; `fileKey` is the version's own copy of the image, so deleting the still later breaks nothing. */
export type VersionStill = { id: string; atMs: number; caption: string; alt: string; width: number; height: number; fileKey: string };

/**
 * Everything readers see of a tutorial, frozen: the title, the write-up, the cut list, the
 * supplies and their disclosure, the chapters and stills the outputs use, and the ruler. The
 * address (slug), studio and maker's names stay live: they are not what a review approves.
 */
export type VersionContent = {
  format: 1;
  title: string;
  videoUrl: string | null;
  precision: 8 | 16 | 32;
  /** The disclosure readers see (null when no link is sponsored). */
  disclosure: string | null;
  doc: DocJson;
  pieces: VersionPiece[];
  materials: VersionMaterial[];
  supplies: VersionSupply[];
  chapters: { id: string; title: string; startMs: number }[];
  stills: VersionStill[];
};

/** Why a version was kept: a coordinator approved, published or sent back the tutorial (or its update). */
export type VersionKind = 'approved' | 'published' | 'sent_back';

/**
 * A frozen copy of everything readers see of a tutorial (DESIGN.md T4). Published versions are
 * what the public page, the exports and the reader's view show; approved ones are what
 * publishing makes live; sent-back ones are what "what changed since it was sent back" compares.
 */
export class TutorialVersion extends Model<InferAttributes<TutorialVersion>, InferCreationAttributes<TutorialVersion>> {
  declare id: CreationOptional<string>;
  declare tutorialId: ForeignKey<string>;
  declare kind: VersionKind;
  declare content: VersionContent;
  declare createdById: ForeignKey<string | null>;
  declare note: CreationOptional<string>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare createdBy?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    TutorialVersion.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        kind: { type: DataTypes.TEXT, allowNull: false },
        content: { type: DataTypes.JSONB, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tutorial_versions' },
    );
  }
}

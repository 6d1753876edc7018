import type { Length } from './length';

/** Which side of a piece a score line runs across: its position is measured along that dimension. */
export type ScoreAxis = 'width' | 'height';

/** A fold line on a piece. */
export interface ScoreLine {
  /** The dimension the position is measured along ("at 4 1/4 on the 8 1/2 width"). */
  axis: ScoreAxis;
  /** Distance from the left (width) or top (height) edge. */
  at: Length;
  /** A glue tab's fold: allowed nearer the edge and other lines than the usual 1/8 in. */
  tab?: boolean;
}

/**
 * Which way the paper's grain must run in a piece: along its length (its longer side), along its
 * width (its shorter side), or any way. Paper folds and bends cleanly with the grain.
 */
export type Grain = 'length' | 'width' | 'any';

export const GRAINS: readonly Grain[] = ['length', 'width', 'any'];

/** The outline a piece is cut to. Its width and height are its size; round shapes keep both as the diameter. */
export type PieceShape = 'rect' | 'circle' | 'oval' | 'rounded-rect' | 'scalloped-rect' | 'scalloped-circle' | 'tag' | 'pillow-box';

export const PIECE_SHAPES: readonly PieceShape[] = ['rect', 'circle', 'oval', 'rounded-rect', 'scalloped-rect', 'scalloped-circle', 'tag', 'pillow-box'];

/** Shapes whose width and height are both the diameter. */
export const ROUND_SHAPES: readonly PieceShape[] = ['circle', 'scalloped-circle'];

/** How a tag's top corners are cut. */
export type TagTop = 'clipped' | 'rounded';

/** The sizes a shape needs beyond its width and height; each shape reads only its own. */
export interface ShapeParams {
  /** Rounded rectangle: the corner radius. */
  cornerRadius?: Length;
  /** Scalloped shapes: the width of one scallop (its diameter), kept as given; the count follows. */
  scallopSize?: Length;
  /** Scalloped shapes: scallops along the top edge (rectangle) or all round (circle); the size follows. */
  scallopCount?: number;
  /** Tag: clipped (cut at 45 degrees) or rounded top corners. */
  tagTop?: TagTop;
  /** Tag: how far a clip runs along each edge, or the corner radius. */
  tagCorner?: Length;
  /** Tag: the hole's diameter (0 or absent: no hole). */
  holeDiameter?: Length;
  /** Tag: from the top edge to the hole's centre. */
  holeFromTop?: Length;
  /** Pillow box: how deep the box puffs out at the middle. */
  depth?: Length;
  /** Pillow box: the glue flap along one side. */
  glueFlap?: Length;
}

/** One row of the cut list. */
export interface Piece {
  id: string;
  name: string;
  /** Material name, e.g. "white cardstock"; pieces of a material share its stock sheet. */
  material: string;
  quantity: number;
  shape: PieceShape;
  /** Shape sizes beyond width and height (corner radius, scallops, tag hole, box depth). */
  params?: ShapeParams;
  /** A pillow box's width and height are the finished box's; its flat blank is larger (see pieceExtent). */
  width: Length;
  /** For a circle both width and height equal the diameter. */
  height: Length;
  /** Which way the grain must run; any by default. */
  grain?: Grain;
  scoreLines: ScoreLine[];
  /** Id of the piece this one sits on as a mat (layer), if any. */
  matOn?: string | null;
  notes?: string;
}

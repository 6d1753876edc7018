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

/** One row of the cut list. */
export interface Piece {
  id: string;
  name: string;
  /** Material name, e.g. "white cardstock"; pieces of a material share its stock sheet. */
  material: string;
  quantity: number;
  shape: 'rect' | 'circle';
  width: Length;
  /** For a circle both width and height equal the diameter. */
  height: Length;
  scoreLines: ScoreLine[];
  /** Id of the piece this one sits on as a mat (layer), if any. */
  matOn?: string | null;
  notes?: string;
}

/**
 * JSON shapes of the write-up's own nodes and what renderers are handed at render time.
 * The live nodes (cut list, supplies) store no rows: the rows come from the Cut list
 * and Supplies sections when a document is rendered, so an edit there shows up everywhere.
 */

import type { PieceShape } from '../measure/piece';
import { SUPPLY_CATEGORIES } from '../schemas/supply';

/** Names of the nodes this project adds to the Tiptap schema. */
export const ARTICLE_NODE_NAMES = ['step', 'stepTitle', 'still', 'cutList', 'supplyList', 'tip', 'caution'] as const;
export type ArticleNodeName = (typeof ARTICLE_NODE_NAMES)[number];

/** `step`: one numbered step. Its number is its position among the document's steps. */
export interface StepAttrs {
  /** A stable id that comments anchor to; unique within the document. */
  id: string | null;
  /** Where the step starts in the video, in milliseconds; null when it has no time. */
  atMs: number | null;
  /** The chapter the step was drafted from, if any. */
  chapterId: string | null;
}

/** `still`: a frame from the tutorial's stills (or another photo), with caption and alt text. */
export interface StillAttrs {
  /** The still's id in the Footage section; null for a photo that is not one of them. */
  stillId: string | null;
  /** "/media/..." or an absolute http(s) address. */
  src: string;
  alt: string;
  caption: string;
  width: number | null;
  height: number | null;
}

export const CUT_LIST_UNITS = ['both', 'in', 'mm'] as const;
export type CutListUnits = (typeof CUT_LIST_UNITS)[number];

/** `cutList`: a live view of the tutorial's cut list. */
export interface CutListAttrs {
  /** Which sizes to show: inches with millimetres beside them, or one system only. */
  units: CutListUnits;
}

/** `supplyList`: a live view of the tutorial's supplies. */
export interface SupplyListAttrs {
  /** Group the supplies under their category names. */
  grouped: boolean;
}

/** One cut-list row as a renderer receives it: display strings already made by the caller. */
export interface RenderPiece {
  name: string;
  material: string;
  quantity: number;
  shape: PieceShape;
  /** Display form, e.g. "4 1/4 in"; for a circle, its diameter. */
  width: string;
  /** Display form; ignored for a circle. */
  height: string;
  widthMm: number;
  heightMm: number;
  /** Display forms, e.g. ["2 in", "4 in"] (from the left or top edge, as the caller words it). */
  scoreLines: string[];
  notes?: string;
}

/** Supply categories in the order a supplies list shows them (DESIGN.md W4). */
export { SUPPLY_CATEGORIES };
export type SupplyCategory = (typeof SUPPLY_CATEGORIES)[number];

/** One supply as a renderer receives it. */
export interface RenderSupply {
  /** One of SUPPLY_CATEGORIES; anything else is listed after them under its own name. */
  category: SupplyCategory | (string & {});
  name: string;
  quantity?: string | number;
  note?: string;
  url?: string;
  sponsored?: boolean;
  discountCode?: string;
}

/** What the HTML and Markdown renderers are given besides the document. */
export interface RenderContext {
  pieces?: RenderPiece[];
  supplies?: RenderSupply[];
  /** The ruler precision the inch sizes were made with, stated under the cut list. */
  precision?: 8 | 16 | 32;
  /** The video page; steps with a time get "Watch at m:ss" linking to `${videoUrl}#t=seconds`. */
  videoUrl?: string;
  /** Sponsorship disclosure shown with the supplies when any link is sponsored. */
  disclosure?: string;
  /**
   * Lets a publisher swap a still's address and size for a resized copy. Return null to leave
   * the still out. The result is checked like any other image address.
   */
  resolveStill?: (still: StillAttrs) => StillAttrs | null;
}

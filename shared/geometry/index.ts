/** Geometry helpers with their working shown, the sheet plan and the stock sheet table. */
export { wrapStrip, type WrapResult } from './wrap';
export { lidCircle, DEFAULT_LID_CLEARANCE, type LidResult } from './lid';
export { cardBase, FOLD_LABELS, FOLD_STYLES, type CardBaseResult, type FoldStyle } from './card-base';
export { notchMarks } from './notches';
export {
  DEFAULT_HOLE,
  DEFAULT_HOLE_FROM_TOP,
  DEFAULT_SCALLOP,
  DEFAULT_TAG_CORNER,
  pathData,
  pieceExtent,
  isLengthParam,
  LENGTH_PARAMS,
  readShapeParams,
  SHAPE_LABELS,
  shapeOutline,
  shapeSummary,
  type PathCmd,
  type StoredShapeParams,
} from './shapes';
export { defaultGrain, pieceGrainAxis, type SheetGrain } from './grain';
export { planSheets, placementsOf, type PlanPiece } from './sheet-plan';
export { SHEET_SIZES, sheetSize } from './sheets';
export { tileLength, type TileSpan } from './tiles';

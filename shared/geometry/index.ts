/** Geometry helpers with their working shown, the sheet plan and the stock sheet table. */
export { wrapStrip, circumferenceBounds, type WrapInput, type WrapResult } from './wrap';
export { lidCircle, DEFAULT_LID_CLEARANCE, type LidInput, type LidResult } from './lid';
export { cardBase, FOLD_STYLES, type CardBaseInput, type CardBaseResult, type FoldStyle } from './card-base';
export { planSheets, type PlanInput, type PlanPiece, type Placement, type PlanError, type SheetPlan } from './sheet-plan';
export { guillotineCuts, layoutProblems, type CutTree, type LaidRect } from './guillotine';
export { SHEET_SIZES, sheetSize, type SheetSize, type SheetSizeId } from './sheets';
export { piBounds, type PiBounds } from './pi';

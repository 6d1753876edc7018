/**
 * Grain rules: paper folds and bends cleanly along its grain, so a piece may name the way its grain
 * must run, and a stock sheet the way its grain does run. A piece bound to a grain may only be laid
 * on a sheet the way that lines the two up; turning it is allowed only when turning lines them up.
 */
import { compareLengths, type Length } from '../measure/length';
import type { Grain } from '../measure/piece';

/** Which side of a stock sheet (as drawn: width across, height down) its grain runs along; 'none' when not known. */
export type SheetGrain = 'height' | 'width' | 'none';

export const SHEET_GRAINS: readonly SheetGrain[] = ['height', 'width', 'none'];

/**
 * The grain a new piece gets when none is given: wrap strips, walls, bands and rims along their
 * length (a wall bends cleanly only with the grain running round it; common practice), else any.
 */
export function defaultGrain(p: { name: string; shape: string }): Grain {
  return p.shape === 'rect' && /\b(strip|wall|band|rim|wrap)/i.test(p.name) ? 'length' : 'any';
}

/** The axis a piece's grain runs along as laid upright: 'x' along its width, 'y' along its height. */
export function pieceGrainAxis(p: { width: Length; height: Length; grain?: Grain }): 'x' | 'y' | null {
  const g = p.grain ?? 'any';
  if (g === 'any') return null;
  // "Length" is the longer side; a square's length is its height side.
  const lengthAxis = compareLengths(p.width, p.height) > 0 ? 'x' : 'y';
  if (g === 'length') return lengthAxis;
  return lengthAxis === 'x' ? 'y' : 'x';
}

/** Which ways a piece may lie on a sheet, and why not when neither. */
export interface Orientations {
  upright: boolean;
  turned: boolean;
  /** Set when the grain, not the size, decides: for the plan's note and the checks. */
  reason?: string;
}

/**
 * How a piece may be laid on a stock sheet: upright always, turned when the material allows it;
 * a grain-bound piece on a sheet of known grain only the way that runs its grain with the sheet's.
 */
export function allowedOrientations(
  p: { width: Length; height: Length; grain?: Grain; name?: string },
  sheet: { rotate: boolean; grain?: SheetGrain },
): Orientations {
  const axis = pieceGrainAxis(p);
  const sheetGrain = sheet.grain ?? 'none';
  if (axis === null || sheetGrain === 'none') return { upright: true, turned: sheet.rotate };
  const sheetAxis = sheetGrain === 'width' ? 'x' : 'y';
  const upright = axis === sheetAxis;
  const turned = sheet.rotate && !upright;
  if (upright || turned) return { upright, turned };
  const label = p.name ? `"${p.name}"` : 'This piece';
  return {
    upright: false,
    turned: false,
    reason: `${label} needs its grain along its ${p.grain}, which lies across the sheet's grain, and turning is off for this material`,
  };
}

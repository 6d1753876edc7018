import { z } from 'zod';
import type { Grain, LengthDto, PieceShape, SheetGrain } from './piece';

export const sheetPlanQuery = z.object({
  kits: z.coerce.number().int('Use a whole number of kits').min(1, 'At least 1 kit').max(500, 'At most 500 kits').default(1),
  spares: z.coerce.number().int('Use a whole number of spares').min(0, 'Spares start at 0').max(100, 'At most 100 spares').default(0),
});

/**
 * How much one sheet plan may lay out. The planner's work grows with the distinct pieces
 * (copies are laid in bulk), so both are bounded: the cut list's pieces, and the pieces to
 * cut over every kit (pieces x quantity x (kits + spares)).
 */
export const SHEET_PLAN_LIMITS = { pieces: 1_000, copies: 100_000 } as const;

const thousands = (n: number) => n.toLocaleString('en-US');

/**
 * Why a plan of this size is refused, naming the limit, or null when it is within bounds.
 * `pieces` counts the cut list's rows; `perSet` the pieces one kit needs (quantities summed).
 */
export function sheetPlanTooLarge(pieces: number, perSet: number, sets: number): string | null {
  if (pieces > SHEET_PLAN_LIMITS.pieces)
    return `A sheet plan takes at most ${thousands(SHEET_PLAN_LIMITS.pieces)} pieces in the cut list; this one has ${thousands(pieces)}. Plan the materials separately.`;
  const copies = perSet * sets;
  if (copies > SHEET_PLAN_LIMITS.copies)
    return `A sheet plan lays out at most ${thousands(SHEET_PLAN_LIMITS.copies)} pieces (pieces x kits); ${thousands(perSet)} a kit x ${thousands(sets)} kits and spares is ${thousands(copies)}. Plan fewer kits at a time.`;
  return null;
}

/** A length as the API sends it: exact stored form, numbers for drawing, and display texts. */
export type PlanLengthDto = LengthDto;

/** Copies of one piece side by side, `across` x `down`, from (x, y); inches from the sheet's top-left corner. */
export type PlanBlockDto = {
  name: string;
  x: number;
  y: number;
  /** One piece as laid. */
  width: number;
  height: number;
  rotated: boolean;
  shape: PieceShape;
  /** One piece's cut line as laid (turned when rotated), SVG path data in inches from its corner; null for a rectangle. */
  outline: string | null;
  /** The grain the piece needs; on a sheet of known grain it is laid to run with it. */
  grain: Grain;
  across: number;
  down: number;
};

/** `count` identical sheets, the first numbered `first` (from 1). */
export type SheetPatternDto = { first: number; count: number; pieces: number; blocks: PlanBlockDto[] };

export type MaterialPlanDto = {
  material: string;
  materialId: string | null;
  sheet: { width: PlanLengthDto; height: PlanLengthDto; label: string };
  rotate: boolean;
  grain: SheetGrain;
  sheets: number;
  /** Pieces placed over every sheet. */
  pieces: number;
  areaLowerBound: number;
  waste: number;
  /** False when the time budget stopped the search for fewer sheets early. */
  complete: boolean;
  patterns: SheetPatternDto[];
  errors: { name: string; count: number; reason: string }[];
};

export type SheetPlanDto = { kits: number; spares: number; materials: MaterialPlanDto[] };

import type { PlacementDto } from '../api/types';

/** The placements of each sheet, sheet 0 first; a sheet with nothing on it still gets its (empty) list. */
export function placementsBySheet(placements: readonly PlacementDto[], sheets: number): PlacementDto[][] {
  const out: PlacementDto[][] = Array.from({ length: Math.max(0, sheets) }, () => []);
  for (const p of placements) (out[p.sheet] ??= []).push(p);
  return out;
}

/**
 * A label size in inches (the drawing's unit) that fits the piece: about a fifth of its short side,
 * and narrow enough for the name across the long side; null when even the smallest would not fit.
 */
export function labelSize(p: Pick<PlacementDto, 'width' | 'height' | 'name'>): number | null {
  const short = Math.min(p.width, p.height);
  const long = Math.max(p.width, p.height);
  // A sans glyph is about 0.55 em wide on average.
  const byWidth = (long * 0.9) / Math.max(1, p.name.length * 0.55);
  const size = Math.min(0.45, short / 4, byWidth);
  return size < 0.12 ? null : size;
}

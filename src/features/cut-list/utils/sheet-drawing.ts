import type { PlanBlockDto } from '@shared/schemas/sheet-plan';

/** One piece of a block, where the drawing puts it. */
export type DrawnPiece = Pick<PlanBlockDto, 'name' | 'x' | 'y' | 'width' | 'height' | 'rotated' | 'shape' | 'outline'>;

/** Blocks of up to this many copies are drawn piece by piece; larger ones as one ruled block. */
export const CELLS_DRAWN = 64;

/** Every copy of a block, left to right and top to bottom. */
export function blockCells(b: PlanBlockDto): DrawnPiece[] {
  const out: DrawnPiece[] = [];
  for (let j = 0; j < b.down; j++)
    for (let i = 0; i < b.across; i++)
      out.push({
        name: b.name,
        x: b.x + i * b.width,
        y: b.y + j * b.height,
        width: b.width,
        height: b.height,
        rotated: b.rotated,
        shape: b.shape,
        outline: b.outline,
      });
  return out;
}

/** "Sheet 3", or "Sheets 3–9" for several alike. */
export function patternLabel(first: number, count: number): string {
  return count === 1 ? `Sheet ${first}` : `Sheets ${first}–${first + count - 1}`;
}

/**
 * A label size in inches (the drawing's unit) that fits the piece: about a fifth of its short side,
 * and narrow enough for the name across the long side; null when even the smallest would not fit.
 */
export function labelSize(p: Pick<DrawnPiece, 'width' | 'height' | 'name'>): number | null {
  const short = Math.min(p.width, p.height);
  const long = Math.max(p.width, p.height);
  // A sans glyph is about 0.55 em wide on average.
  const byWidth = (long * 0.9) / Math.max(1, p.name.length * 0.55);
  const size = Math.min(0.45, short / 4, byWidth);
  return size < 0.12 ? null : size;
}

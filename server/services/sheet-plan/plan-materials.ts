/**
 * The sheet plans of a cut list's materials, from plain serializable input to the API's DTOs.
 * Pure (shared code only, no database), so it runs the same on the event loop for a small
 * plan and in the planning worker thread for a large one.
 */
// Relative imports throughout: the worker thread loads this file without the app's path aliases.
import {
  formatLength,
  formatMm,
  inchesNumber,
  mmNumber,
  parseStoredLength,
  serializeLength,
  type Grain,
  type Length,
  type PieceShape,
} from '../../../shared/measure';
import {
  pathData,
  pieceExtent,
  planSheets,
  readShapeParams,
  shapeOutline,
  type PathCmd,
  type SheetGrain,
  type StoredShapeParams,
} from '../../../shared/geometry';
import type { MaterialPlanDto, PlanLengthDto } from '../../../shared/schemas/sheet-plan';

/** One material's plan request; lengths in their stored form ("169/16 in"). */
export type MaterialJob = {
  material: string;
  materialId: string | null;
  sheet: { width: string; height: string };
  rotate: boolean;
  /** Which side of the stock sheet its grain runs along. */
  grain?: SheetGrain;
  pieces: { name: string; width: string; height: string; qty: number; shape: PieceShape; params?: StoredShapeParams; grain?: Grain }[];
  /** Pieces left out before planning (a stored size that cannot be used), reported with the plan's errors. */
  unusable?: { name: string; qty: number; reason: string }[];
};

/** A piece's cut line as laid on the sheet (turned a quarter clockwise when rotated), as SVG path data in inches. */
function laidOutline(p: MaterialJob['pieces'][number], rotated: boolean): string | null {
  if (p.shape === 'rect') return null;
  try {
    const o = shapeOutline({ shape: p.shape, width: parseStoredLength(p.width), height: parseStoredLength(p.height), params: readShapeParams(p.params) });
    if (!rotated) return pathData(o.cut);
    // (x, y) -> (h - y, x): an arc keeps its radii swapped and its angles a quarter on.
    const turn = (c: PathCmd): PathCmd => {
      if (c.op === 'Z') return c;
      if (c.op !== 'A') return { ...c, x: o.height - c.y, y: c.x };
      const q = Math.PI / 2;
      return { ...c, cx: o.height - c.cy, cy: c.cx, rx: c.ry, ry: c.rx, start: c.start + q, end: c.end + q, x: o.height - c.y, y: c.x };
    };
    return pathData(o.cut.map(turn));
  } catch (e) {
    if (e instanceof RangeError) return null;
    throw e;
  }
}

const lengthDto = (l: Length): PlanLengthDto => ({
  value: serializeLength(l),
  inches: inchesNumber(l),
  mm: mmNumber(l),
  display: formatLength(l),
  mmDisplay: formatMm(l),
});

/**
 * Plans each material on its stock sheets for `kits` plus `spares`. `budgetMs` is shared by the
 * materials: each gets what is left of it for trying further orders (its first try always runs).
 */
export function planMaterials(jobs: readonly MaterialJob[], kits: number, spares: number, budgetMs?: number): MaterialPlanDto[] {
  const started = Date.now();
  return jobs.map((job) => {
    const sheet = { width: parseStoredLength(job.sheet.width), height: parseStoredLength(job.sheet.height) };
    const left = budgetMs === undefined ? undefined : Math.max(0, budgetMs - (Date.now() - started));
    // A shape is cut from its bounding box on a trimmer (a pillow box from its flat blank), then by hand.
    const plan = planSheets(
      {
        sheet,
        rotate: job.rotate,
        grain: job.grain,
        kits,
        spares,
        pieces: job.pieces.map((p) => {
          const extent = pieceExtent({
            shape: p.shape,
            width: parseStoredLength(p.width),
            height: parseStoredLength(p.height),
            params: readShapeParams(p.params),
          });
          return { name: p.name, width: extent.width, height: extent.height, qty: p.qty, grain: p.grain };
        }),
      },
      { budgetMs: left },
    );
    return {
      material: job.material,
      materialId: job.materialId,
      sheet: { width: lengthDto(sheet.width), height: lengthDto(sheet.height), label: `${formatLength(sheet.width)} x ${formatLength(sheet.height)}` },
      rotate: job.rotate,
      grain: job.grain ?? 'none',
      sheets: plan.sheets,
      pieces: plan.pieces,
      areaLowerBound: plan.areaLowerBound,
      waste: plan.waste,
      complete: plan.complete,
      patterns: plan.patterns.map((pt) => ({
        first: pt.first + 1,
        count: pt.count,
        pieces: pt.pieces,
        blocks: pt.blocks.map((b) => ({
          name: b.name,
          x: inchesNumber(b.x),
          y: inchesNumber(b.y),
          width: inchesNumber(b.width),
          height: inchesNumber(b.height),
          rotated: b.rotated,
          shape: job.pieces[b.piece]?.shape ?? 'rect',
          outline: job.pieces[b.piece] ? laidOutline(job.pieces[b.piece]!, b.rotated) : null,
          grain: job.pieces[b.piece]?.grain ?? 'any',
          across: b.across,
          down: b.down,
        })),
      })),
      errors: [
        ...(job.unusable ?? []).map((u) => ({ name: u.name, count: u.qty * (kits + spares), reason: u.reason })),
        ...plan.errors.map((e) => ({ name: e.name, count: e.count, reason: e.reason })),
      ],
    };
  });
}

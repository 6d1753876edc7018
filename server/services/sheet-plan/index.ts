import { serializeLength, storedLengthOrNull } from '@shared/measure';
import { LENGTH_PARAMS, type StoredShapeParams } from '@shared/geometry';
import { SHEET_PLAN_LIMITS, sheetPlanTooLarge, type SheetPlanDto } from '@shared/schemas/sheet-plan';
import { Material, PieceRow, type Tutorial } from '../../models';
import { UnprocessableError } from '../../lib/errors';
import { stockOf } from '../cut-list';
import { planMaterials, type MaterialJob } from './plan-materials';
import { PlanPool } from './worker-pool';

/** Up to this many pieces a plan takes a few milliseconds: less than handing it to the thread. */
const INLINE_PIECES = 40;
/** Time for looking for fewer sheets; the first complete layout is always kept. */
const SEARCH_BUDGET_MS = 2_000;

const pool = new PlanPool({ hardLimitMs: 20_000, maxWaiting: 4 });

/** A SheetPlanDto already serialized, so a large answer never passes through JSON.stringify on the event loop. */
export type SheetPlanJson = string & { readonly __dto?: SheetPlanDto };

/**
 * One sheet plan per material (pieces without a material are grouped as "unassigned"), for
 * `kits` plus `spares`, as the JSON of a SheetPlanDto. Refused with 422 past SHEET_PLAN_LIMITS;
 * large plans run in the planning thread so the server keeps answering while they are worked
 * out, and the event loop only reads the rows (raw, lengths left in their stored form).
 */
export async function sheetPlanJson(tutorial: Tutorial, kits: number, spares: number): Promise<SheetPlanJson> {
  const [pieces, materials] = await Promise.all([
    PieceRow.findAll({
      where: { tutorialId: tutorial.id },
      attributes: ['name', 'material', 'quantity', 'shape', 'params', 'grain', 'width', 'height'],
      order: [
        ['position', 'ASC'],
        ['createdAt', 'ASC'],
      ],
      raw: true,
    }),
    Material.findAll({ where: { tutorialId: tutorial.id }, order: [['name', 'ASC']] }),
  ]);
  const perSet = pieces.reduce((s, p) => s + p.quantity, 0);
  const tooLarge = sheetPlanTooLarge(pieces.length, perSet, kits + spares);
  if (tooLarge) throw new UnprocessableError(tooLarge, { limit: SHEET_PLAN_LIMITS, requested: { pieces: pieces.length, copies: perSet * (kits + spares) } });

  const groups = new Map<string, typeof pieces>();
  for (const p of pieces) groups.set(p.material, [...(groups.get(p.material) ?? []), p]);
  const jobs: MaterialJob[] = [...groups.entries()].map(([name, list]) => {
    const { material: m, width, height, rotate, grain, unreadable } = stockOf(materials, name);
    // Stored sizes that cannot be used (old or hand-written rows) are reported, never planned.
    const usable = unreadable ? [] : list.filter(sizesUsable);
    const unusable = list
      .filter((p) => !usable.includes(p))
      .map((p) => ({
        name: p.name,
        qty: p.quantity,
        reason: unreadable
          ? `the stock sheet size of “${name}” cannot be used; enter it again in the Cut list`
          : 'a stored size of this piece cannot be used; enter it again in the Cut list',
      }));
    return {
      material: name || 'unassigned',
      materialId: m?.id ?? null,
      sheet: { width: serializeLength(width), height: serializeLength(height) },
      rotate,
      grain,
      pieces: usable.map((p) => ({ name: p.name, width: p.width, height: p.height, qty: p.quantity, shape: p.shape, params: p.params, grain: p.grain })),
      unusable,
    };
  });
  if (pieces.length <= INLINE_PIECES)
    return JSON.stringify({ kits, spares, materials: planMaterials(jobs, kits, spares, SEARCH_BUDGET_MS) } satisfies SheetPlanDto);
  return pool.run(jobs, kits, spares, SEARCH_BUDGET_MS);
}

/** Whether every stored length of a raw piece row reads and lies within bounds (see readPieceRow in the cut list). */
function sizesUsable(p: { width: string; height: string; params: StoredShapeParams | null }): boolean {
  if (!storedLengthOrNull(p.width) || !storedLengthOrNull(p.height)) return false;
  return LENGTH_PARAMS.every((k) => p.params?.[k] === undefined || p.params?.[k] === null || storedLengthOrNull(p.params[k]) !== null);
}

/** Starts the planning thread early, so the first large plan does not wait for it. */
export function warmSheetPlans(): void {
  pool.warm();
}

/** Ends the planning thread (the server is stopping). */
export function closeSheetPlans(): Promise<void> {
  return pool.close();
}

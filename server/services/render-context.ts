import type { RenderContext } from '@shared/editor';
import type { RulerPrecision } from '@shared/measure';
import type { Tutorial } from '../models';
import { loadCutList } from './cut-list';
import { loadSupplies } from './supplies';
import { toRenderPieces, toRenderSupplies } from './publish/render-inputs';

/** The cut list and supplies as the write-up's live nodes show them, in the crafter's words. */
export async function renderContext(tutorial: Tutorial, extra: Partial<RenderContext> = {}): Promise<RenderContext> {
  const [cut, sup] = await Promise.all([loadCutList(tutorial), loadSupplies(tutorial)]);
  const precision = tutorial.precision as RulerPrecision;
  return {
    pieces: toRenderPieces(cut.pieces, precision),
    supplies: toRenderSupplies(sup.supplies),
    precision,
    disclosure: sup.disclosure.required ? sup.disclosure.text : undefined,
    ...extra,
  };
}

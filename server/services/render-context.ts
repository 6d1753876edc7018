import type { RenderContext, RenderPiece, RenderSupply } from '@shared/editor';
import { formatLength, mmNumber } from '@shared/measure';
import type { Tutorial } from '../models';
import { loadCutList } from './cut-list';
import { loadSupplies } from '../routes/supplies/supplies.router';

/** The cut list and supplies as the write-up's live nodes show them, in the crafter's words. */
export async function renderContext(tutorial: Tutorial, extra: Partial<RenderContext> = {}): Promise<RenderContext> {
  const [cut, sup] = await Promise.all([loadCutList(tutorial), loadSupplies(tutorial)]);
  const pieces: RenderPiece[] = cut.pieces.map((p) => ({
    name: p.name,
    material: p.material,
    quantity: p.quantity,
    shape: p.shape,
    width: formatLength(p.width),
    height: formatLength(p.height),
    widthMm: mmNumber(p.width),
    heightMm: mmNumber(p.height),
    scoreLines: p.scoreLines.map((s) => `${formatLength(s.at)} from the ${s.axis === 'width' ? 'left' : 'top'}${s.tab ? ' (tab)' : ''}`),
    notes: p.notes,
  }));
  const supplies: RenderSupply[] = sup.supplies.map((s) => ({
    category: s.category,
    name: s.name,
    quantity: s.quantity || undefined,
    note: s.note || undefined,
    url: s.url ?? undefined,
    sponsored: s.sponsored,
    discountCode: s.discountCode ?? undefined,
  }));
  return { pieces, supplies, precision: tutorial.precision, disclosure: sup.disclosure.required ? sup.disclosure.text : undefined, ...extra };
}

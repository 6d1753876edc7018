/**
 * The rows the shared renderers (shared/editor) expect, made from the engine's exact lengths
 * with the engine's display strings.
 */
import type { RenderPiece, RenderSupply } from '@shared/editor/types';
import { mmNumber, type Piece, type RulerPrecision } from '@shared/measure';
import { inchText, scoreLineText } from './sizes';
import type { PublishSupply } from './types';

/** Cut-list rows for renderDocHtml: inch display forms ("10 9/16 in") and millimetres for the lighter text. */
export function toRenderPieces(pieces: readonly Piece[], precision: RulerPrecision): RenderPiece[] {
  return pieces.map((p) => ({
    name: p.name,
    material: p.material,
    quantity: p.quantity,
    shape: p.shape,
    width: inchText(p.width, precision),
    height: inchText(p.shape === 'circle' ? p.width : p.height, precision),
    widthMm: mmNumber(p.width),
    heightMm: mmNumber(p.shape === 'circle' ? p.width : p.height),
    scoreLines: p.scoreLines.map((s) => scoreLineText(s, precision, true)),
    ...(p.notes?.trim() ? { notes: p.notes.trim() } : {}),
  }));
}

/** Supplies for the shared renderers (null fields left out). */
export function toRenderSupplies(supplies: readonly PublishSupply[]): RenderSupply[] {
  return supplies.map((s) => ({
    category: s.category,
    name: s.name,
    ...(s.quantity.trim() ? { quantity: s.quantity.trim() } : {}),
    ...(s.note.trim() ? { note: s.note.trim() } : {}),
    ...(s.url ? { url: s.url } : {}),
    sponsored: s.sponsored,
    ...(s.discountCode?.trim() ? { discountCode: s.discountCode.trim() } : {}),
  }));
}

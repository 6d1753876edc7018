/**
 * The rows the shared renderers (shared/editor) expect, made from the engine's exact lengths
 * with the engine's display strings.
 */
import type { RenderContext, RenderPiece, RenderSupply } from '@shared/editor/types';
import { mmNumber, ROUND_SHAPES, type Piece, type RulerPrecision } from '@shared/measure';
import { inchText, scoreLineText } from './sizes';
import type { PublishBundle, PublishSupply } from './types';

/** Cut-list rows for renderDocHtml: inch display forms ("10 9/16 in") and millimetres for the lighter text. */
export function toRenderPieces(pieces: readonly Piece[], precision: RulerPrecision): RenderPiece[] {
  return pieces.map((p) => ({
    name: p.name,
    material: p.material,
    quantity: p.quantity,
    shape: p.shape,
    width: inchText(p.width, precision),
    height: inchText(ROUND_SHAPES.includes(p.shape) ? p.width : p.height, precision),
    widthMm: mmNumber(p.width),
    heightMm: mmNumber(ROUND_SHAPES.includes(p.shape) ? p.width : p.height),
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

/** The live lists' rows of a bundle, for renderers of the write-up (the Markdown export). */
export function bundleRenderContext(bundle: PublishBundle): RenderContext {
  return {
    pieces: toRenderPieces(bundle.pieces, bundle.precision),
    supplies: toRenderSupplies(bundle.supplies),
    precision: bundle.precision,
    ...(bundle.tutorial.videoUrl ? { videoUrl: bundle.tutorial.videoUrl } : {}),
    ...(bundle.disclosure?.trim() ? { disclosure: bundle.disclosure.trim() } : {}),
  };
}

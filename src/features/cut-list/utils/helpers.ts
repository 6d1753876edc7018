import { cardBase, lidCircle, wrapStrip, type CardBaseResult, type FoldStyle, type LidResult, type WrapResult } from '@shared/geometry';
import { formatLength, readBoundedLength, type Length, type LengthUnit, type RulerPrecision } from '@shared/measure';

/** A helper's answer: the result, or one message per field that could not be read. */
export type HelperRun<T> = { ok: true; result: T } | { ok: false; errors: Record<string, string> };

type Ctx = { unit: LengthUnit; precision: RulerPrecision };

function need(text: string, field: string, label: string, ctx: Ctx, errors: Record<string, string>, optional = false): Length | undefined {
  if (text.trim() === '') {
    if (!optional) errors[field] = `Enter the ${label}`;
    return undefined;
  }
  // Negative, out-of-bounds and (for a size) zero lengths are refused in words; an optional amount
  // such as an overlap or a clearance may be none.
  const r = readBoundedLength(text, { defaultUnit: ctx.unit, allowZero: optional });
  if (!r.ok) {
    errors[field] = r.message;
    return undefined;
  }
  return r.length;
}

function guard<T>(errors: Record<string, string>, run: () => T, field: string): HelperRun<T> {
  if (Object.keys(errors).length) return { ok: false, errors };
  try {
    return { ok: true, result: run() };
  } catch (e) {
    // The engine refuses impossible inputs (zero diameter, negative overlap) with a sentence.
    return { ok: false, errors: { [field]: (e as Error).message.replace(/^./, (c) => c.toUpperCase()) } };
  }
}

export type WrapForm = { diameter: string; strips: string; overlap: string; thickness: string };

/** Runs the Wrap helper on the form's texts. */
export function runWrap(f: WrapForm, ctx: Ctx): HelperRun<WrapResult> {
  const errors: Record<string, string> = {};
  const diameter = need(f.diameter, 'diameter', 'diameter', ctx, errors);
  const overlap = need(f.overlap, 'overlap', 'overlap', ctx, errors, true);
  const thickness = need(f.thickness, 'thickness', 'paper thickness', ctx, errors, true);
  const strips = f.strips.trim() === '' ? 1 : Number(f.strips);
  if (!Number.isInteger(strips) || strips < 1 || strips > 99) errors.strips = 'Use a whole number of strips from 1 to 99';
  return guard(errors, () => wrapStrip({ diameter: diameter!, pieces: strips, overlap, thickness, precision: ctx.precision }), 'diameter');
}

/**
 * The wall strip's note in the cut list: "Wraps a 3 1/2 in circle in 2 strips with 1/2 in overlap
 * each", with every length in its display form and unit, however it was typed ("3.5", "three and a half").
 */
export function wrapNote(f: WrapForm, ctx: Ctx): string {
  const errors: Record<string, string> = {};
  const diameter = need(f.diameter, 'diameter', 'diameter', ctx, errors);
  const overlap = need(f.overlap, 'overlap', 'overlap', ctx, errors, true);
  const strips = Number(f.strips) || 1;
  const circle = diameter ? `Wraps a ${formatLength(diameter)} circle` : 'Wraps a circle';
  return `${circle}${strips > 1 ? ` in ${strips} strips` : ''}${overlap && overlap.value.n !== 0n ? ` with ${formatLength(overlap)} overlap each` : ''}`;
}

export type LidForm = { diameter: string; wall: string; clearance: string };

/** Runs the Lid helper on the form's texts; an empty clearance takes the engine's default. */
export function runLid(f: LidForm, ctx: Ctx): HelperRun<LidResult> {
  const errors: Record<string, string> = {};
  const diameter = need(f.diameter, 'diameter', 'base diameter', ctx, errors);
  const wall = need(f.wall, 'wall', 'wall thickness', ctx, errors, true);
  const clearance = need(f.clearance, 'clearance', 'clearance', ctx, errors, true);
  return guard(errors, () => lidCircle({ diameter: diameter!, wall, clearance, precision: ctx.precision }), 'diameter');
}

export type CardForm = { width: string; height: string; fold: FoldStyle; relief?: string; caliper?: string; outerFlap?: string; stopper?: string };

/** Which of the card base's extra fields a fold reads. */
export function cardFields(fold: FoldStyle): { relief: boolean; caliper: boolean; outerFlap: boolean; stopper: boolean } {
  return {
    relief: fold === 'gatefold' || fold === 'shutter' || fold === 'tri-fold',
    caliper: fold !== 'top' && fold !== 'side',
    outerFlap: fold === 'shutter',
    stopper: fold === 'easel',
  };
}

/** Runs the Card base helper on the form's texts; empty extras take the engine's defaults. */
export function runCardBase(f: CardForm, ctx: Ctx): HelperRun<CardBaseResult> {
  const errors: Record<string, string> = {};
  const width = need(f.width, 'width', 'finished width', ctx, errors);
  const height = need(f.height, 'height', 'finished height', ctx, errors);
  const use = cardFields(f.fold);
  const relief = use.relief ? need(f.relief ?? '', 'relief', 'relief', ctx, errors, true) : undefined;
  const caliper = use.caliper ? need(f.caliper ?? '', 'caliper', 'caliper', ctx, errors, true) : undefined;
  const outerFlap = use.outerFlap ? need(f.outerFlap ?? '', 'outerFlap', 'outer flap', ctx, errors, true) : undefined;
  const stopper = use.stopper ? need(f.stopper ?? '', 'stopper', 'stopper position', ctx, errors, true) : undefined;
  const field = outerFlap ? 'outerFlap' : stopper ? 'stopper' : 'width';
  return guard(errors, () => cardBase({ width: width!, height: height!, fold: f.fold, relief, caliper, outerFlap, stopper, precision: ctx.precision }), field);
}

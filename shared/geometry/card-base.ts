import { addLengths, compareLengths, formatLength, formatMm, inches, scaleLength, subtractLengths, sumLengths, toInches, type Length } from '../measure/length';
import type { Grain, ScoreLine } from '../measure/piece';
import { DEFAULT_PRECISION, isOnRuler, roundDownToMark, type RulerPrecision } from '../measure/ruler';

/**
 * How a card base folds:
 * - top, side: one fold, front and back the same size;
 * - gatefold: two flaps of half the width fold in and meet in the middle of the back;
 * - z-fold: three equal panels folded one way then the other;
 * - tri-fold: three panels rolled in, the panel that tucks inside narrower than the others;
 * - shutter: a gatefold whose flaps are folded back once more, so each side has an inner and an
 *   outer flap (the outer one may be narrower, for a stepped look);
 * - easel: a top-fold card whose front folds back at its middle and stands on a stopper.
 */
export type FoldStyle = 'top' | 'side' | 'gatefold' | 'z-fold' | 'tri-fold' | 'shutter' | 'easel';

export const FOLD_STYLES: readonly FoldStyle[] = ['side', 'top', 'gatefold', 'z-fold', 'tri-fold', 'shutter', 'easel'];

/** The words the interface and the working use for each fold. */
export const FOLD_LABELS: Record<FoldStyle, string> = {
  top: 'Top fold',
  side: 'Side fold',
  gatefold: 'Gatefold',
  'z-fold': 'Z-fold',
  'tri-fold': 'Tri-fold',
  shutter: 'Shutter',
  easel: 'Easel',
};

/** 1/16 in: the usual gap left where two flaps meet, and the usual clearance of a tucked panel (common practice). */
export const DEFAULT_RELIEF: Length = inches([1, 16]);

export interface CardBaseInput {
  /** Finished (folded) width. */
  width: Length;
  /** Finished (folded) height. */
  height: Length;
  fold: FoldStyle;
  /**
   * Gap left where flaps meet (gatefold, shutter) and the clearance a tucked panel gives up
   * (tri-fold), so nothing rubs or buckles when closed. 1/16 in by default.
   */
  relief?: Length;
  /**
   * Caliper (thickness) of the stock. A panel that tucks inside another fold gives up about one
   * caliper for each fold that wraps around it (the fold bends around the tucked sheet).
   */
  caliper?: Length;
  /** Shutter only: width of each outer flap; the inner flap's width by default, never wider. */
  outerFlap?: Length;
  /** Easel only: how far the stopper's back edge sits from the card's bottom (front) edge; half the height by default. */
  stopper?: Length;
  precision?: RulerPrecision;
}

/** One panel of the flat card, in order from the left (or the top for top folds and easels). */
export interface CardPanel {
  name: string;
  size: Length;
}

/** Where the easel's stopper goes, and the lean it gives. */
export interface EaselStopper {
  /** From the card's bottom (front) edge to the stopper's back edge, on the inside of the base. */
  fromEdge: Length;
  /** From the main fold to the stopper's back edge. */
  fromFold: Length;
  /** Angle between the standing front and the table, in degrees (for display only). */
  leanDegrees: number;
}

export interface CardBaseResult {
  /** Size to cut the card base flat. */
  flatWidth: Length;
  flatHeight: Length;
  scoreLines: ScoreLine[];
  panels: CardPanel[];
  /** Folds crease cleanly with the grain: the grain runs parallel to the score lines (common practice). */
  grain: Grain;
  stopper?: EaselStopper;
  working: string[];
}

function isPositive(l: Length): boolean {
  const v = toInches(l);
  return v.s > 0n && v.n > 0n;
}

function isNegative(l: Length): boolean {
  const v = toInches(l);
  return v.s < 0n && v.n > 0n;
}

const both = (l: Length) => `${formatLength(l)} (${formatMm(l)})`;

/** The grain that runs along the fold lines, as a piece's grain (its length is its longer side). */
function grainAlongFolds(axis: 'width' | 'height', flatWidth: Length, flatHeight: Length): Grain {
  // Score lines measured along the width run top to bottom, parallel to the height side.
  const parallelTo = axis === 'width' ? flatHeight : flatWidth;
  const other = axis === 'width' ? flatWidth : flatHeight;
  const c = compareLengths(parallelTo, other);
  if (c > 0) return 'length';
  if (c < 0) return 'width';
  // A square: its "length" is the height side.
  return axis === 'width' ? 'length' : 'width';
}

/**
 * The flat card base, its panels and score lines for a finished size and fold, with the working
 * shown line by line. Flaps that meet are cut to the ruler mark at or below their share, so the
 * gap is never smaller than the relief; a tucked panel also gives up the caliper of the fold
 * around it. Throws RangeError with a sentence when the input cannot make a card.
 */
export function cardBase(input: CardBaseInput): CardBaseResult {
  const { width: w, height: h, fold } = input;
  const precision = input.precision ?? DEFAULT_PRECISION;
  const relief = input.relief ?? DEFAULT_RELIEF;
  const caliper = input.caliper ?? inches(0);
  if (!isPositive(w) || !isPositive(h)) throw new RangeError('the finished width and height must be above zero');
  if (isNegative(relief)) throw new RangeError('the relief cannot be negative');
  if (isNegative(caliper)) throw new RangeError('the caliper cannot be negative');
  if (compareLengths(caliper, inches([1, 8])) > 0) throw new RangeError('a caliper over 1/8 in is board, not card; check the thickness');
  const size = (a: Length, b: Length) => `${formatLength(a)} x ${formatLength(b)} (${formatMm(a)} x ${formatMm(b)})`;
  const working = [`Finished card: ${size(w, h)}, ${FOLD_LABELS[fold].toLowerCase()}`];
  const down = (l: Length) => roundDownToMark(l, precision);

  // Panels along the axis the card folds across: the width, or the height for top folds and easels.
  const axis: 'width' | 'height' = fold === 'top' || fold === 'easel' ? 'height' : 'width';
  const alongName = axis === 'width' ? 'width' : 'height';
  let panels: CardPanel[];
  let stopper: EaselStopper | undefined;

  switch (fold) {
    case 'side':
      panels = [
        { name: 'back', size: w },
        { name: 'front', size: w },
      ];
      working.push(
        `A side fold puts the front and back side by side: flat width = 2 × ${formatLength(w)} = ${formatLength(scaleLength(w, 2))}; the height stays ${formatLength(h)}`,
      );
      break;
    case 'top':
      panels = [
        { name: 'back', size: h },
        { name: 'front', size: h },
      ];
      working.push(
        `A top fold stacks the front above the back: flat height = 2 × ${formatLength(h)} = ${formatLength(scaleLength(h, 2))}; the width stays ${formatLength(w)}`,
      );
      break;
    case 'z-fold':
      panels = [
        { name: 'back', size: w },
        { name: 'middle', size: w },
        { name: 'front', size: w },
      ];
      working.push(
        `A z-fold has three equal panels folded one way and then the other, so no panel sits inside a fold: flat width = 3 × ${formatLength(w)} = ${formatLength(scaleLength(w, 3))}`,
      );
      break;
    case 'gatefold': {
      const share = scaleLength(subtractLengths(w, relief), [1, 2]);
      if (!isPositive(share)) throw new RangeError(`the relief (${formatLength(relief)}) leaves no room for the flaps of a ${formatLength(w)} card`);
      const flap = down(share);
      if (!isPositive(flap)) throw new RangeError(`the flaps would be narrower than the 1/${precision} in ruler mark`);
      working.push(
        `A gatefold's two flaps fold in over a back of the full width and meet in the middle, leaving the ${formatLength(relief)} relief between them: each flap = (${formatLength(w)} − ${formatLength(relief)}) ÷ 2 = ${formatLength(share)}`,
      );
      if (!isOnRuler(share, precision)) working.push(`Round each flap down to the 1/${precision} in ruler (a flap too wide rubs its neighbour): ${both(flap)}`);
      const gap = subtractLengths(w, scaleLength(flap, 2));
      working.push(`The flaps leave a ${both(gap)} gap where they meet`);
      panels = [
        { name: 'left flap', size: flap },
        { name: 'back', size: w },
        { name: 'right flap', size: flap },
      ];
      working.push(`Flat width = ${formatLength(flap)} + ${formatLength(w)} + ${formatLength(flap)} = ${formatLength(sumLengths(panels.map((p) => p.size)))}`);
      break;
    }
    case 'tri-fold': {
      working.push(
        'A tri-fold rolls in: the end panel folds inside first, then the front closes over it, so the tucked panel must be narrower than the others to lie flat',
      );
      let tuck = subtractLengths(w, relief);
      let line = `Tucked panel = ${formatLength(w)} − ${formatLength(relief)} relief`;
      if (isPositive(caliper)) {
        tuck = subtractLengths(tuck, caliper);
        line += ` − ${formatLength(caliper)} fold allowance (the front's fold wraps around the tucked panel, taking about one caliper)`;
      }
      working.push(`${line} = ${formatLength(tuck)}`);
      if (!isPositive(tuck)) throw new RangeError('the relief and caliper leave no room for the tucked panel');
      const cut = down(tuck);
      if (!isOnRuler(tuck, precision)) working.push(`Round the tucked panel down to the 1/${precision} in ruler: ${both(cut)}`);
      if (!isPositive(cut)) throw new RangeError(`the tucked panel would be narrower than the 1/${precision} in ruler mark`);
      panels = [
        { name: 'back', size: w },
        { name: 'front', size: w },
        { name: 'tucked panel', size: cut },
      ];
      working.push(`Flat width = ${formatLength(w)} + ${formatLength(w)} + ${formatLength(cut)} = ${formatLength(sumLengths(panels.map((p) => p.size)))}`);
      break;
    }
    case 'shutter': {
      const share = scaleLength(subtractLengths(w, relief), [1, 2]);
      if (!isPositive(share)) throw new RangeError(`the relief (${formatLength(relief)}) leaves no room for the flaps of a ${formatLength(w)} card`);
      const inner = down(share);
      if (!isPositive(inner)) throw new RangeError(`the flaps would be narrower than the 1/${precision} in ruler mark`);
      working.push(
        `A shutter card folds an inner flap in over each side of the back and an outer flap back over it; the folds between them meet in the middle, leaving the ${formatLength(relief)} relief: inner flap = (${formatLength(w)} − ${formatLength(relief)}) ÷ 2 = ${formatLength(share)}`,
      );
      if (!isOnRuler(share, precision)) working.push(`Round the inner flap down to the 1/${precision} in ruler: ${both(inner)}`);
      let outer = inner;
      if (input.outerFlap) {
        if (!isPositive(input.outerFlap)) throw new RangeError('the outer flap must be above zero');
        if (compareLengths(input.outerFlap, inner) > 0)
          throw new RangeError(
            `the outer flap (${formatLength(input.outerFlap)}) cannot be wider than the inner flap (${formatLength(inner)}): it would stick out past the back`,
          );
        outer = input.outerFlap;
        working.push(
          `Outer flaps ${both(outer)}, ${compareLengths(outer, inner) < 0 ? `narrower than the inner ones by ${formatLength(subtractLengths(inner, outer))} for a stepped look` : 'as wide as the inner ones'}`,
        );
      } else working.push(`Outer flaps as wide as the inner ones: ${both(outer)}`);
      panels = [
        { name: 'left outer flap', size: outer },
        { name: 'left inner flap', size: inner },
        { name: 'back', size: w },
        { name: 'right inner flap', size: inner },
        { name: 'right outer flap', size: outer },
      ];
      working.push(
        `Flat width = 2 × (${formatLength(outer)} + ${formatLength(inner)}) + ${formatLength(w)} = ${formatLength(sumLengths(panels.map((p) => p.size)))}; the folds meet with a ${both(subtractLengths(w, scaleLength(inner, 2)))} gap`,
      );
      break;
    }
    case 'easel': {
      const half = scaleLength(h, [1, 2]);
      panels = [
        { name: 'back (the base it stands on)', size: h },
        { name: 'front, upper half', size: half },
        { name: 'front, lower half (decorated)', size: half },
      ];
      working.push(
        `An easel card is a top-fold card whose front folds back at its middle: flat height = 2 × ${formatLength(h)} = ${formatLength(scaleLength(h, 2))}, scored at ${formatLength(h)} (the main fold) and at ${formatLength(addLengths(h, half))} (the middle of the front)`,
      );
      working.push('Glue the decorated panel to the lower half of the front only, so the upper half can fold back');
      // The two halves of the front and the stretch of base between the fold and the stopper make a triangle.
      const fromEdge = input.stopper ?? half;
      if (!isPositive(fromEdge) || compareLengths(fromEdge, h) >= 0)
        throw new RangeError(`the stopper must sit on the base, between its bottom edge and the fold (0 to ${formatLength(h)})`);
      const fromFold = subtractLengths(h, fromEdge);
      // The two half-panels are equal sides of a triangle whose base is the stopper's distance from the fold.
      const cos = toInches(fromFold).div(toInches(h)).valueOf();
      const lean = (Math.acos(cos) * 180) / Math.PI;
      stopper = { fromEdge, fromFold, leanDegrees: lean };
      working.push(
        `The stopper's back edge ${formatLength(fromEdge)} from the bottom edge is ${formatLength(fromFold)} from the fold; the two ${formatLength(half)} halves of the front and that ${formatLength(fromFold)} of base make a triangle, so the front leans back at arccos(${formatLength(fromFold)} ÷ ${formatLength(h)}) = ${lean.toFixed(1)}° from the table`,
      );
      if (input.stopper === undefined) working.push('With the stopper at half the height the triangle is equilateral: the front stands at 60°');
      if (lean < 40) working.push('Below about 40° the front lies back steeply: move the stopper toward the fold to stand it up');
      if (lean > 80) working.push('Above about 80° the front is nearly upright and may tip forward: move the stopper toward the bottom edge');
      break;
    }
  }

  const flatAlong = sumLengths(panels.map((p) => p.size));
  const flatWidth = axis === 'width' ? flatAlong : w;
  const flatHeight = axis === 'height' ? flatAlong : h;
  const scoreLines: ScoreLine[] = [];
  let at: Length = inches(0);
  for (const p of panels.slice(0, -1)) {
    at = addLengths(at, p.size);
    scoreLines.push({ axis, at });
  }
  if (isPositive(caliper) && fold !== 'tri-fold')
    working.push(`Caliper ${both(caliper)}: no panel of a ${FOLD_LABELS[fold].toLowerCase()} tucks inside another fold, so no fold allowance is needed`);
  const grain = grainAlongFolds(axis, flatWidth, flatHeight);
  working.push(
    `Cut ${size(flatWidth, flatHeight)} and score across the ${alongName} at ${scoreLines
      .map((s) => formatLength(s.at))
      .join(', ')
      .replace(/, ([^,]*)$/, ' and $1')}`,
  );
  working.push(`Cut it with the grain running along the score lines (${axis === 'width' ? 'top to bottom' : 'side to side'}) so the folds crease cleanly`);
  return { flatWidth, flatHeight, scoreLines, panels, grain, stopper, working };
}

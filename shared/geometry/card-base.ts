import { formatLength, formatMm, scaleLength, toInches, type Length } from '../measure/length';
import type { ScoreLine } from '../measure/piece';

/** Where a card folds: along the top, along the left side, or two flaps meeting in the middle. */
export type FoldStyle = 'top' | 'side' | 'gatefold';

export const FOLD_STYLES: readonly FoldStyle[] = ['top', 'side', 'gatefold'];

export interface CardBaseInput {
  /** Finished (folded) width. */
  width: Length;
  /** Finished (folded) height. */
  height: Length;
  fold: FoldStyle;
}

export interface CardBaseResult {
  /** Size to cut the card base flat. */
  flatWidth: Length;
  flatHeight: Length;
  scoreLines: ScoreLine[];
  working: string[];
}

function isPositive(l: Length): boolean {
  const v = toInches(l);
  return v.s > 0n && v.n > 0n;
}

/**
 * The flat card base and its score lines for a finished size and fold:
 * a side fold doubles the width, a top fold doubles the height, a gatefold
 * doubles the width with two flaps of half the width that meet in the middle.
 */
export function cardBase(input: CardBaseInput): CardBaseResult {
  const { width: w, height: h, fold } = input;
  if (!isPositive(w) || !isPositive(h)) throw new RangeError('the finished width and height must be above zero');
  const size = (a: Length, b: Length) => `${formatLength(a)} x ${formatLength(b)} (${formatMm(a)} x ${formatMm(b)})`;
  const working = [`Finished card: ${size(w, h)}, ${fold === 'gatefold' ? 'gatefold' : `${fold} fold`}`];
  if (fold === 'side') {
    const fw = scaleLength(w, 2);
    working.push(`A side fold puts the front and back side by side: flat width = 2 × ${formatLength(w)} = ${formatLength(fw)}; the height stays ${formatLength(h)}`);
    working.push(`Cut ${size(fw, h)} and score across the width at ${formatLength(w)}`);
    return { flatWidth: fw, flatHeight: h, scoreLines: [{ axis: 'width', at: w }], working };
  }
  if (fold === 'top') {
    const fh = scaleLength(h, 2);
    working.push(`A top fold stacks the front above the back: flat height = 2 × ${formatLength(h)} = ${formatLength(fh)}; the width stays ${formatLength(w)}`);
    working.push(`Cut ${size(w, fh)} and score across the height at ${formatLength(h)}`);
    return { flatWidth: w, flatHeight: fh, scoreLines: [{ axis: 'height', at: h }], working };
  }
  const fw = scaleLength(w, 2);
  const flap = scaleLength(w, [1, 2]);
  const second = scaleLength(w, [3, 2]);
  working.push(`A gatefold has a back panel of the full width and two flaps of half the width that meet in the middle: flat width = ${formatLength(flap)} + ${formatLength(w)} + ${formatLength(flap)} = ${formatLength(fw)}`);
  working.push(`Cut ${size(fw, h)} and score across the width at ${formatLength(flap)} and ${formatLength(second)}`);
  return { flatWidth: fw, flatHeight: h, scoreLines: [{ axis: 'width', at: flap }, { axis: 'width', at: second }], working };
}

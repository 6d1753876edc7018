import Fraction from 'fraction.js';
import { convertLength, formatLength, formatMm, inches, toInches, type Length } from '../measure/length';

/** Notches along a tab that bends round a curve: about every 1/2 in (common practice). */
export const DEFAULT_NOTCH_SPACING: Length = inches([1, 2]);

export interface NotchInput {
  /** Length of the tab the notches run along. */
  length: Length;
  /** Distance between notches; 1/2 in by default. */
  spacing?: Length;
}

export interface NotchResult {
  /** Number of notches. */
  count: number;
  spacing: Length;
  /** From each end of the tab to the nearest notch (the same at both ends). */
  endGap: Length;
  /** Every notch, measured from the start of the tab, in inches. */
  positions: Length[];
  working: string[];
}

/**
 * Notch marks spaced evenly along a tab and centred on it, so neither end is left with a sliver
 * of tab: as many notches as fit with both end pieces at least half the spacing wide. With n
 * notches the end gap is (length - (n - 1) x spacing) / 2, which lies in [spacing / 2, spacing).
 */
export function notchMarks(input: NotchInput): NotchResult {
  const L = toInches(input.length);
  const spacing = input.spacing ?? DEFAULT_NOTCH_SPACING;
  const s = toInches(spacing);
  if (L.s < 0n || L.n === 0n) throw new RangeError('the tab must be longer than zero');
  if (s.s < 0n || s.n === 0n) throw new RangeError('the notch spacing must be above zero');
  const ratio = L.div(s);
  const count = Number(ratio.n / ratio.d);
  const endGap = count === 0 ? L.div(2) : L.sub(s.mul(count - 1)).div(2);
  const positions: Length[] = [];
  for (let k = 0; k < count; k++) positions.push({ value: endGap.add(s.mul(k)), unit: 'in' });
  // Shown in the tab's own unit, so a metric strip reads in millimetres.
  const gap: Length = convertLength({ value: endGap, unit: 'in' }, input.length.unit);
  const working =
    count === 0
      ? [`The ${formatLength(input.length)} tab is shorter than the ${formatLength(spacing)} spacing: it needs no notch`]
      : [
          `${formatLength(input.length)} ÷ ${formatLength(spacing)} = ${new Fraction(ratio).round(3).toString()}, so ${count} notch${count === 1 ? '' : 'es'} fit with no end piece narrower than half the spacing`,
          `Notch every ${formatLength(spacing)} (${formatMm(spacing)}), centred: the first and last ${formatLength(gap)} (${formatMm(gap)}) from the ends`,
        ];
  return { count, spacing, endGap: gap, positions, working };
}

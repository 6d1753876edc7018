import type Fraction from 'fraction.js';
import { addLengths, compareLengths, convertLength, toInches, type Length } from './length';
import type { ScoreAxis } from './piece';

/** At most this many lines come out of one repeat, so a tiny step cannot flood a piece. */
export const MAX_REPEATED_LINES = 200;

/**
 * Repeated score lines over a piece: `first`, `first + every`, ... while strictly inside the piece
 * (a line on the far edge is no fold). Exact, in the step's unit when the two share one.
 * Empty when the step is not positive or the first line is outside the piece.
 */
export function expandScoreStep(first: Length, every: Length, along: Length, max = MAX_REPEATED_LINES): Length[] {
  if (toInches(every).compare(0) <= 0 || toInches(first).compare(0) <= 0) return [];
  const out: Length[] = [];
  let at = first.unit === every.unit ? first : convertLength(first, every.unit);
  while (compareLengths(at, along) < 0 && out.length < max) {
    out.push(at);
    at = addLengths(at, every);
  }
  return out;
}

/** A run of score lines as the cut list shows it: one line, or an even repeat ("every 1/4 in"). */
export type ScoreLineGroup<L> = { kind: 'line'; line: L } | { kind: 'every'; axis: ScoreAxis; lines: L[]; step: Length; from: Length; to: Length };

/**
 * Groups lines on the same side with the same spacing, three or more in a row, into one repeat,
 * so "every 1/4 in" shows as that rather than as two dozen positions. Order is kept.
 */
export function groupScoreLines<L extends { axis: ScoreAxis; at: Length }>(lines: readonly L[]): ScoreLineGroup<L>[] {
  const out: ScoreLineGroup<L>[] = [];
  const inches = lines.map((l) => toInches(l.at));
  const gap = (k: number): Fraction | null => (lines[k]!.axis === lines[k - 1]!.axis ? inches[k]!.sub(inches[k - 1]!) : null);
  let i = 0;
  while (i < lines.length) {
    let j = i + 1;
    const step = j < lines.length ? gap(j) : null;
    if (step && step.compare(0) > 0) while (j + 1 < lines.length && gap(j + 1)?.equals(step)) j++;
    if (step && step.compare(0) > 0 && j - i + 1 >= 3) {
      const run = lines.slice(i, j + 1);
      const first = run[0]!.at;
      const stepLength = { value: first.unit === 'in' ? step : convertLength({ value: step, unit: 'in' }, first.unit).value, unit: first.unit };
      out.push({ kind: 'every', axis: run[0]!.axis, lines: run, step: stepLength, from: first, to: run[run.length - 1]!.at });
      i = j + 1;
    } else {
      out.push({ kind: 'line', line: lines[i]! });
      i++;
    }
  }
  return out;
}

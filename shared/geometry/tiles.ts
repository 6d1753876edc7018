/**
 * Tiling a piece too long for one printed page: the piece is split into equal parts that
 * overlap, so the printed parts can be laid one on the next, taped and cut as one piece.
 * Worked out exactly (fractions of an inch), so the joined parts add up to the piece to the
 * last digit: n parts of span s with n - 1 overlaps of o give n s - (n - 1) o = L.
 */
import Fraction from 'fraction.js';

/** Overlap between two printed parts of a tiled piece: 1/2 in, room for tape (common practice). */
export const DEFAULT_TILE_OVERLAP = new Fraction(1, 2);

/** One part of a tiled length: it shows [start, end] of the piece. */
export interface TileSpan {
  start: Fraction;
  end: Fraction;
}

/** How a length is split into printed parts. */
export interface Tiling {
  /** The parts in order; one part when the length fits. */
  spans: TileSpan[];
  /** Every part's span (all equal). */
  span: Fraction;
  overlap: Fraction;
  /**
   * Where part k - 1 ends and part k's overlap zone ends (k from 1): the join line. Part k shows
   * [join - overlap, ...], so its first `overlap` lies under part k - 1 once joined.
   */
  joins: Fraction[];
}

const ceilInt = (f: Fraction): number => {
  const c = f.ceil();
  return Number(c.n) * (c.s < 0n ? -1 : 1);
};

/**
 * Splits a length L into the fewest equal parts no longer than `max`, each overlapping the next
 * by `overlap`: n = ceil((L - o) / (max - o)) parts of (L + (n - 1) o) / n. A length that fits
 * is one part. Throws a RangeError when `max` is not longer than the overlap.
 */
export function tileLength(length: Fraction, max: Fraction, overlap: Fraction = DEFAULT_TILE_OVERLAP): Tiling {
  if (length.compare(0) <= 0) throw new RangeError('the length to tile must be above zero');
  if (overlap.compare(0) < 0) throw new RangeError('the overlap cannot be negative');
  if (length.compare(max) <= 0) return { spans: [{ start: new Fraction(0), end: length }], span: length, overlap, joins: [] };
  if (max.compare(overlap) <= 0) throw new RangeError('a printed part must be longer than the overlap');
  const n = Math.max(2, ceilInt(length.sub(overlap).div(max.sub(overlap))));
  const span = length.add(overlap.mul(n - 1)).div(n);
  const step = span.sub(overlap);
  const spans: TileSpan[] = [];
  for (let k = 0; k < n; k++) spans.push({ start: step.mul(k), end: step.mul(k).add(span) });
  // The last part ends exactly on the length: n (s - o) + o = n s - (n - 1) o = L.
  return { spans, span, overlap, joins: spans.slice(1).map((s) => s.start.add(overlap)) };
}

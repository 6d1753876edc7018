import Fraction from 'fraction.js';
import { formatLength, formatMm, inches, roundForDisplay, toInches, type Length } from '../measure/length';
import { DEFAULT_PRECISION, type RulerPrecision } from '../measure/ruler';
import { piBounds } from './pi';

export interface WrapInput {
  /** Diameter of the circle (the form or base) the strip goes around. */
  diameter: Length;
  /** How many strips share the circumference (1 by default). */
  pieces?: number;
  /** Overlap tab added to each strip (0 by default). */
  overlap?: Length;
  /** Paper thickness (caliper); the strip runs along the mean diameter d + t. 0 by default. */
  thickness?: Length;
  precision?: RulerPrecision;
}

export interface WrapResult {
  /** Length to cut each strip: rounded up to the ruler, in inches. */
  stripLength: Length;
  /** Each strip before rounding, as a float for display only. */
  unroundedInches: number;
  /** How much longer the cut strip is than needed (extra overlap), as a float for display only. */
  extraInches: number;
  working: string[];
}

const ceilDiv = (n: bigint, d: bigint): bigint => {
  const q = n / d;
  return n % d !== 0n && n > 0n === d > 0n ? q + 1n : q;
};

function ceilToMark(x: Fraction, p: bigint): bigint {
  const scaled = x.mul(p);
  return ceilDiv(scaled.s < 0n ? -scaled.n : scaled.n, scaled.d);
}

function dec(f: Fraction, places = 4): string {
  return roundForDisplay(f, places);
}

/** A number of strips must be a whole number from 1 up. */
function checkPieces(n: number): void {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`the number of strips must be a whole number of at least 1 (got ${n})`);
}

/**
 * The strip that wraps a circle: pi x (d + t) / n + overlap, rounded UP to
 * the ruler (a long strip only overlaps more, a short one leaves a gap).
 * Pi is bracketed by rationals and tightened until both ends round to the
 * same mark, so the rounding is exact.
 */
export function wrapStrip(input: WrapInput): WrapResult {
  const n = input.pieces ?? 1;
  checkPieces(n);
  const precision = input.precision ?? DEFAULT_PRECISION;
  const p = BigInt(precision);
  const overlap = input.overlap ?? inches(0);
  const thickness = input.thickness ?? inches(0);
  const d = toInches(input.diameter);
  const t = toInches(thickness);
  const o = toInches(overlap);
  if (d.s < 0n || d.n === 0n) throw new RangeError('the diameter must be above zero');
  if (t.s < 0n || o.s < 0n) throw new RangeError('thickness and overlap cannot be negative');
  const mean = d.add(t);
  const perStrip = mean.div(n);

  let digits = 40;
  let k: bigint;
  let lo: Fraction;
  for (;;) {
    const pi = piBounds(digits);
    lo = pi.lo.mul(perStrip).add(o);
    const hi = pi.hi.mul(perStrip).add(o);
    const kLo = ceilToMark(lo, p);
    const kHi = ceilToMark(hi, p);
    if (kLo === kHi) {
      k = kLo;
      break;
    }
    // the true value lies within 10^-digits of a mark: look closer (pi is irrational, so this ends)
    digits *= 2;
  }
  const strip: Length = { value: new Fraction(k, p), unit: 'in' };
  const circumference = piBounds(digits).lo.mul(mean);
  const working: string[] = [];
  working.push(
    t.n === 0n
      ? `Diameter d = ${formatLength(input.diameter)}${d.d === 1n && input.diameter.unit === 'in' ? '' : ` (${dec(d)} in)`}; no paper thickness given, so the strip runs along d itself`
      : `Mean diameter = d + t = ${formatLength(input.diameter)} + ${formatLength(thickness)} = ${dec(mean)} in (a wrapped strip runs along the middle of its own thickness)`,
  );
  working.push(`Circumference = π × ${dec(mean)} in = ${dec(circumference)} in`);
  if (n > 1) working.push(`Shared by ${n} strips: ${dec(circumference)} in ÷ ${n} = ${dec(perStrip.mul(piBounds(digits).lo))} in each`);
  if (o.n !== 0n) working.push(`Add the ${formatLength(overlap)} overlap: ${dec(lo.sub(o))} in + ${dec(o)} in = ${dec(lo)} in`);
  working.push(
    `Round up to the next 1/${precision} in mark (a long strip only overlaps more; a short one leaves a gap): ${formatLength(strip)} = ${dec(strip.value)} in (${formatMm(strip)})`,
  );
  const extra = strip.value.sub(lo);
  working.push(
    `Cut ${n > 1 ? `each of the ${n} strips` : 'the strip'} ${formatLength(strip)}: ${dec(extra)} in (${formatMm({ value: extra, unit: 'in' }, 2)}) longer than the exact need`,
  );
  return { stripLength: strip, unroundedInches: lo.valueOf(), extraInches: extra.valueOf(), working };
}

import Fraction from 'fraction.js';
import { formatLength, formatAmount, roundForDisplay, toInches, toMm, type Length } from './length';

/** Finest mark the crafter's ruler shows, as a denominator of an inch. */
export type RulerPrecision = 8 | 16 | 32;

export const RULER_PRECISIONS: readonly RulerPrecision[] = [8, 16, 32];

/** Sixteenths are the everyday imperial ruler, so they are the default. */
export const DEFAULT_PRECISION: RulerPrecision = 16;

/** Which ruler a check compares against: inch marks (1/precision in) or whole millimetres. */
export type RulerSystem = 'inch' | 'metric';

/** Where a length falls on the ruler. */
export interface RulerMark {
  /** The nearest mark, in inches for the inch ruler and millimetres for the metric one. */
  mark: Length;
  /** length - mark, exact and signed, in inches. */
  errorInches: Fraction;
  /** length - mark, exact and signed, in millimetres. */
  errorMm: Fraction;
  /** True when the length sits exactly on a mark. */
  onRuler: boolean;
}

/** Whether a value is a valid ruler precision. */
export function isRulerPrecision(p: unknown): p is RulerPrecision {
  return p === 8 || p === 16 || p === 32;
}

function roundHalfUp(f: Fraction): bigint {
  // floor(f + 1/2) on the exact value
  const num = f.s < 0n ? -f.n : f.n;
  const twice = 2n * num + f.d;
  const den = 2n * f.d;
  const q = twice / den;
  return twice % den !== 0n && twice < 0n ? q - 1n : q;
}

function ceilFraction(f: Fraction): bigint {
  const num = f.s < 0n ? -f.n : f.n;
  const q = num / f.d;
  return num % f.d !== 0n && num > 0n ? q + 1n : q;
}

/** The nearest mark of the ruler (ties go to the larger mark). */
export function nearestMark(l: Length, precision: RulerPrecision = DEFAULT_PRECISION, system: RulerSystem = 'inch'): RulerMark {
  if (system === 'metric') {
    const mm = toMm(l);
    const k = roundHalfUp(mm);
    const mark: Length = { value: new Fraction(k), unit: 'mm' };
    const errorMm = mm.sub(mark.value);
    return { mark, errorMm, errorInches: errorMm.mul(5, 127), onRuler: errorMm.n === 0n };
  }
  const inch = toInches(l);
  const p = BigInt(precision);
  const k = roundHalfUp(inch.mul(p));
  const mark: Length = { value: new Fraction(k, p), unit: 'in' };
  const errorInches = inch.sub(mark.value);
  return { mark, errorInches, errorMm: errorInches.mul(127, 5), onRuler: errorInches.n === 0n };
}

/** Whether the length sits exactly on a mark of the ruler. */
export function isOnRuler(l: Length, precision: RulerPrecision = DEFAULT_PRECISION, system: RulerSystem = 'inch'): boolean {
  if (system === 'metric') return toMm(l).d === 1n;
  return toInches(l).mul(BigInt(precision)).d === 1n;
}

/** The smallest inch mark at or above the length (cutting long when short would leave a gap). */
export function roundUpToMark(l: Length, precision: RulerPrecision = DEFAULT_PRECISION): Length {
  const p = BigInt(precision);
  return { value: new Fraction(ceilFraction(toInches(l).mul(p)), p), unit: 'in' };
}

function floorFraction(f: Fraction): bigint {
  const num = f.s < 0n ? -f.n : f.n;
  const q = num / f.d;
  return num % f.d !== 0n && num < 0n ? q - 1n : q;
}

/** The largest inch mark at or below the length (a flap cut short only widens its gap; a long one buckles). */
export function roundDownToMark(l: Length, precision: RulerPrecision = DEFAULT_PRECISION): Length {
  const p = BigInt(precision);
  return { value: new Fraction(floorFraction(toInches(l).mul(p)), p), unit: 'in' };
}

/** The nearest inch mark. */
export function roundToMark(l: Length, precision: RulerPrecision = DEFAULT_PRECISION): Length {
  return nearestMark(l, precision, 'inch').mark;
}

/** A small signed error for people: "1/48 in (0.53 mm) over". */
export function describeError(mark: RulerMark): string {
  const inch = mark.errorInches.abs();
  const mm = mark.errorMm.abs();
  const dir = mark.errorInches.s < 0n ? 'under' : 'over';
  const inchText = inch.d <= 64n ? `${formatAmount(inch, 'in')} in` : `${roundForDisplay(inch, 4)} in`;
  return `${inchText} (${roundForDisplay(mm, 2)} mm) ${dir}`;
}

/**
 * A readable account of an off-ruler length, or null when it is on a mark:
 * "Width 4 1/3 in is between the 1/16 in marks: nearest 4 5/16 in, 1/48 in (0.53 mm) over".
 */
export function describeOffRuler(label: string, l: Length, precision: RulerPrecision = DEFAULT_PRECISION, system: RulerSystem = 'inch'): string | null {
  const mark = nearestMark(l, precision, system);
  if (mark.onRuler) return null;
  const shown = l.unit === 'in' || system === 'metric' ? formatLength(l) : `${formatLength(l)} (${roundForDisplay(toInches(l), 4)} in)`;
  const between = system === 'metric' ? 'between the millimetre marks' : `between the 1/${precision} in marks`;
  return `${label} ${shown} is ${between}: nearest ${formatLength(mark.mark)}, ${describeError(mark)}`;
}

import Fraction from 'fraction.js';

/** Units a crafter gives lengths in. */
export type LengthUnit = 'in' | 'mm' | 'cm';

/**
 * An exact length: a rational amount in the unit it was given in.
 * The unit is kept so the length shows the way the crafter wrote it;
 * comparisons and arithmetic go through exact inches.
 */
export interface Length {
  readonly value: Fraction;
  readonly unit: LengthUnit;
}

/** Anything `Fraction` accepts: 3, "3/8", [3, 8], a bigint, another Fraction. */
export type RationalInput = Fraction | number | bigint | string | [number | bigint, number | bigint];

// 1 in = 25.4 mm exactly (NIST SP 811, Appendix B), so 1 mm = 5/127 in.
const MM_PER_UNIT: Record<LengthUnit, Fraction> = {
  in: new Fraction(127, 5),
  mm: new Fraction(1),
  cm: new Fraction(10),
};

function toFraction(v: RationalInput): Fraction {
  if (v instanceof Fraction) return v;
  if (typeof v === 'number' && !Number.isFinite(v)) throw new RangeError(`not a finite number: ${v}`);
  if (Array.isArray(v)) return new Fraction(v[0], v[1]);
  return new Fraction(v);
}

/** Builds a length from an exact amount and a unit (default inches). */
export function length(value: RationalInput, unit: LengthUnit = 'in'): Length {
  return { value: toFraction(value), unit };
}

/** Shorthand for a length in inches. */
export function inches(value: RationalInput): Length {
  return length(value, 'in');
}

/** Shorthand for a length in millimetres. */
export function millimetres(value: RationalInput): Length {
  return length(value, 'mm');
}

/** Shorthand for a length in centimetres. */
export function centimetres(value: RationalInput): Length {
  return length(value, 'cm');
}

/** The exact amount in inches. */
export function toInches(l: Length): Fraction {
  return l.unit === 'in' ? l.value : l.value.mul(MM_PER_UNIT[l.unit]).div(MM_PER_UNIT.in);
}

/** The exact amount in millimetres. */
export function toMm(l: Length): Fraction {
  return l.unit === 'mm' ? l.value : l.value.mul(MM_PER_UNIT[l.unit]);
}

/** The same length expressed in another unit, still exact. */
export function convertLength(l: Length, unit: LengthUnit): Length {
  if (l.unit === unit) return l;
  return { value: toMm(l).div(MM_PER_UNIT[unit]), unit };
}

/** Float inches for output only (JSON, drawing); never feed it back into arithmetic. */
export function inchesNumber(l: Length): number {
  return toInches(l).valueOf();
}

/** Float millimetres for output only. */
export function mmNumber(l: Length): number {
  return toMm(l).valueOf();
}

/** Exact comparison across units: negative, zero or positive. */
export function compareLengths(a: Length, b: Length): number {
  return toInches(a).compare(toInches(b));
}

/** Exact equality across units (1 in equals 25.4 mm). */
export function lengthsEqual(a: Length, b: Length): boolean {
  return toInches(a).equals(toInches(b));
}

/** Exact equality of amount and unit, as a database round trip must keep it. */
export function sameLength(a: Length, b: Length): boolean {
  return a.unit === b.unit && a.value.equals(b.value);
}

function unitOf(a: Length, b: Length): LengthUnit {
  return a.unit === b.unit ? a.unit : 'in';
}

/** a + b, kept in their unit when they share one, otherwise in inches. */
export function addLengths(a: Length, b: Length): Length {
  const unit = unitOf(a, b);
  return { value: convertLength(a, unit).value.add(convertLength(b, unit).value), unit };
}

/** a - b, kept in their unit when they share one, otherwise in inches. */
export function subtractLengths(a: Length, b: Length): Length {
  const unit = unitOf(a, b);
  return { value: convertLength(a, unit).value.sub(convertLength(b, unit).value), unit };
}

/** The length times an exact factor, in the same unit. */
export function scaleLength(l: Length, factor: RationalInput): Length {
  return { value: l.value.mul(toFraction(factor)), unit: l.unit };
}

/** The sum of several lengths (zero inches for none). */
export function sumLengths(ls: readonly Length[]): Length {
  return ls.reduce<Length>((acc, l) => addLengths(acc, l), length(0, ls[0]?.unit ?? 'in'));
}

// ---------- display ----------

const UNIT_LABEL: Record<LengthUnit, string> = { in: 'in', mm: 'mm', cm: 'cm' };

function isPowerOfTwo(d: bigint): boolean {
  return d > 0n && (d & (d - 1n)) === 0n;
}

/** Whether n/d has a finite decimal expansion (d = 2^a 5^b). */
function terminates(d: bigint): boolean {
  let x = d;
  while (x % 2n === 0n) x /= 2n;
  while (x % 5n === 0n) x /= 5n;
  return x === 1n;
}

/** The exact decimal expansion of a terminating fraction, e.g. 37/100 -> "0.37". */
function exactDecimal(f: Fraction): string {
  const sign = f.s < 0n && f.n !== 0n ? '-' : '';
  let digits = 0;
  let scale = 1n;
  while (scale % f.d !== 0n) {
    scale *= 10n;
    digits++;
  }
  const scaled = (f.n * scale) / f.d;
  const s = scaled.toString().padStart(digits + 1, '0');
  const whole = s.slice(0, s.length - digits);
  const frac = s.slice(s.length - digits);
  return sign + (digits ? `${whole}.${frac}` : whole);
}

/** "10 9/16", "3/8", "12": a mixed number with a proper fraction. */
function mixed(f: Fraction): string {
  const sign = f.s < 0n && f.n !== 0n ? '-' : '';
  const whole = f.n / f.d;
  const rest = f.n % f.d;
  if (rest === 0n) return sign + whole.toString();
  if (whole === 0n) return `${sign}${rest}/${f.d}`;
  return `${sign}${whole} ${rest}/${f.d}`;
}

/**
 * The amount alone as a crafter writes it: inches as mixed fractions when
 * the denominator is a ruler denominator (a power of two), metric as decimals;
 * anything else stays an exact fraction so nothing is silently rounded.
 */
export function formatAmount(value: Fraction, unit: LengthUnit): string {
  if (unit === 'in') {
    if (isPowerOfTwo(value.d)) return mixed(value);
    if (terminates(value.d)) return exactDecimal(value);
    return mixed(value);
  }
  if (terminates(value.d)) return exactDecimal(value);
  return mixed(value);
}

/** A length in its own unit, exactly: "10 9/16 in", "3/8 in", "13 mm", "2.5 cm". */
export function formatLength(l: Length): string {
  return `${formatAmount(l.value, l.unit)} ${UNIT_LABEL[l.unit]}`;
}

/** Rounds for display only ("268.3"), trimming a trailing ".0". */
export function roundForDisplay(f: Fraction, decimals: number): string {
  const scale = 10n ** BigInt(decimals);
  const neg = f.s < 0n && f.n !== 0n;
  // round half away from zero on the exact value
  const scaled = (f.n * scale * 2n + f.d) / (2n * f.d);
  let s = scaled.toString().padStart(decimals + 1, '0');
  if (decimals > 0) s = `${s.slice(0, s.length - decimals)}.${s.slice(s.length - decimals)}`;
  if (s.includes('.')) s = s.replace(/\.?0+$/, '');
  return (neg && s !== '0' ? '-' : '') + s;
}

/** Millimetres for the lighter text beside a length: "268.3 mm". */
export function formatMm(l: Length, decimals = 1): string {
  return `${roundForDisplay(toMm(l), decimals)} mm`;
}

// ---------- storage ----------

const STORED = /^(-?\d+)(?:\/(\d+))? (in|mm|cm)$/;

/** A compact exact form for the database: "169/16 in", "13 mm", "-1/8 in". */
export function serializeLength(l: Length): string {
  const sign = l.value.s < 0n && l.value.n !== 0n ? '-' : '';
  const body = l.value.d === 1n ? `${l.value.n}` : `${l.value.n}/${l.value.d}`;
  return `${sign}${body} ${l.unit}`;
}

/** Reads a value written by `serializeLength`; throws on anything else. */
export function parseStoredLength(s: string): Length {
  const m = STORED.exec(s);
  if (!m) throw new SyntaxError(`not a stored length: ${JSON.stringify(s)}`);
  const n = BigInt(m[1]!);
  const d = m[2] === undefined ? 1n : BigInt(m[2]);
  if (d === 0n) throw new SyntaxError(`not a stored length (zero denominator): ${JSON.stringify(s)}`);
  return { value: new Fraction(n, d), unit: m[3] as LengthUnit };
}

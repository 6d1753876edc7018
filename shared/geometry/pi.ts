import Fraction from 'fraction.js';

/** Rational bounds lo < pi < hi. */
export interface PiBounds {
  lo: Fraction;
  hi: Fraction;
}

const cache = new Map<number, PiBounds>();

/** arctan(1/x) * 10^p, each term truncated (so the sum is off by at most one unit per term). */
function arctanInverse(x: bigint, scale: bigint): { value: bigint; terms: bigint } {
  const x2 = x * x;
  let power = scale / x;
  let sum = power;
  let k = 1n;
  let terms = 1n;
  let sign = -1n;
  while (power !== 0n) {
    power /= x2;
    k += 2n;
    const term = power / k;
    if (term === 0n) break;
    sum += sign * term;
    sign = -sign;
    terms++;
  }
  return { value: sum, terms };
}

/**
 * Pi bracketed by two rationals `digits` decimal places apart, from
 * Machin's formula pi = 16 atan(1/5) - 4 atan(1/239) in exact integers.
 * Used so that rounding pi-based lengths up to a ruler mark is never wrong.
 */
export function piBounds(digits = 60): PiBounds {
  const hit = cache.get(digits);
  if (hit) return hit;
  const guard = 10;
  const scale = 10n ** BigInt(digits + guard);
  const a = arctanInverse(5n, scale);
  const b = arctanInverse(239n, scale);
  const approx = 16n * a.value - 4n * b.value;
  // truncation: each term and each division loses < 1 unit; the series tail is smaller than the first dropped term
  const slack = 16n * (2n * a.terms + 2n) + 4n * (2n * b.terms + 2n);
  const bounds = { lo: new Fraction(approx - slack, scale), hi: new Fraction(approx + slack, scale) };
  cache.set(digits, bounds);
  return bounds;
}

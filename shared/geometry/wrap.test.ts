import Fraction from 'fraction.js';
import fc from 'fast-check';
import { all, create, type BigNumber } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { inches, millimetres, serializeLength, toInches, type Length } from '../measure/length';
import { parseLength } from '../measure/parse-length';
import { wrapStrip } from './wrap';

const L = (s: string): Length => parseLength(s)!;
// Reference: pi x (d + t) / n + o rounded up to 1/p, computed with mathjs BigNumber at 100 digits.
const math = create(all, { number: 'BigNumber', precision: 100 });
// with number: 'BigNumber' the constant is a BigNumber, though the typings say number
const PI = math.pi as unknown as BigNumber;
function reference(d: Fraction, t: Fraction, n: number, o: Fraction, p: number): Fraction {
  const big = (f: Fraction) => math.bignumber(f.n.toString()).div(f.d.toString());
  const x = PI.mul(big(d).add(big(t)))
    .div(n)
    .add(big(o))
    .mul(p);
  return new Fraction(BigInt(x.ceil().toFixed(0)), BigInt(p));
}

describe('wrapStrip (M5)', () => {
  it('worked example: d = 6 3/8, 2 strips, 1/2 in overlap, sixteenths -> 10 9/16 in', () => {
    // pi x 6.375 / 2 = 10.0138..; + 0.5 = 10.5138..; next sixteenth up is 10 9/16 = 10.5625
    const r = wrapStrip({ diameter: L('6 3/8'), pieces: 2, overlap: L('1/2'), precision: 16 });
    expect(serializeLength(r.stripLength)).toBe('169/16 in');
    expect(r.unroundedInches).toBeCloseTo(10.5138, 4);
    expect(r.working.join('\n')).toContain('20.0277');
    expect(r.working.join('\n')).toContain('10.0138');
    expect(r.working.join('\n')).toContain('10.5138');
    expect(r.working.at(-2)).toContain('10 9/16 in');
    expect(r.working.at(-2)).toContain('268.3 mm');
  });

  it('adds the paper thickness by the mean-diameter rule (sheet-metal rolling)', () => {
    // pi x (4 + 0.012) = 12.6041..; sixteenths up: 12 5/8
    const r = wrapStrip({ diameter: L('4'), thickness: L('0.012'), precision: 16 });
    expect(serializeLength(r.stripLength)).toBe('101/8 in');
    expect(serializeLength(r.stripLength)).toBe(
      serializeLength({ value: reference(new Fraction(4), new Fraction('0.012'), 1, new Fraction(0), 16), unit: 'in' }),
    );
    // a thickness given in millimetres works the same: 0.3048 mm = 0.012 in
    expect(serializeLength(wrapStrip({ diameter: L('4'), thickness: millimetres('0.3048') }).stripLength)).toBe('101/8 in');
  });

  it('never rounds down (the strip is always at least the need, and within one mark)', () => {
    const r = wrapStrip({ diameter: L('3'), precision: 8 });
    // pi x 3 = 9.4247..; eighths up: 9 1/2
    expect(serializeLength(r.stripLength)).toBe('19/2 in');
    expect(r.extraInches).toBeGreaterThan(0);
    expect(r.extraInches).toBeLessThan(1 / 8);
  });

  it('rounds right where floating point cannot: pi x d within 3e-17 of a mark', () => {
    // d = 78256779 / 245850922 in (from a continued-fraction convergent of pi): pi x d = 1.0000000000000000249 (mathjs, 100 digits),
    // so an eighth-inch ruler needs 1 1/8 in; a double-precision pi x d rounds to exactly 1.
    const d = new Fraction(78256779, 245850922);
    const r = wrapStrip({ diameter: { value: d, unit: 'in' }, precision: 8 });
    expect(toInches(r.stripLength).equals(reference(d, new Fraction(0), 1, new Fraction(0), 8))).toBe(true);
    expect(serializeLength(r.stripLength)).toBe('9/8 in');
  });

  it('agrees with a 100-digit mathjs computation (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 2000 }),
        fc.constantFrom(1, 2, 3, 4, 6),
        fc.integer({ min: 0, max: 16 }),
        fc.constantFrom('0', '0.008', '0.012', '0.0114'),
        fc.constantFrom(8, 16, 32) as fc.Arbitrary<8 | 16 | 32>,
        (d64, n, o16, t, p) => {
          const d = new Fraction(d64, 64);
          const o = new Fraction(o16, 16);
          const r = wrapStrip({ diameter: inches(d), pieces: n, overlap: inches(o), thickness: inches(t), precision: p });
          expect(toInches(r.stripLength).equals(reference(d, new Fraction(t), n, o, p))).toBe(true);
        },
      ),
      { numRuns: 300 },
    );
  });

  it('refuses nonsense', () => {
    expect(() => wrapStrip({ diameter: L('4'), pieces: 0 })).toThrow(RangeError);
    expect(() => wrapStrip({ diameter: L('4'), pieces: 1.5 })).toThrow(RangeError);
    expect(() => wrapStrip({ diameter: L('0') })).toThrow(RangeError);
  });
});

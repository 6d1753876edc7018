import Fraction from 'fraction.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { tileLength } from './tiles';

const F = (n: number, d = 1) => new Fraction(n, d);

describe('tileLength', () => {
  it('a 10 9/16 in wall strip on a 7 1/2 in printable width: 2 parts of 5 17/32 in, joined at 5 17/32 in (worked by hand)', () => {
    // n = ceil((10 9/16 - 1/2) / (7 1/2 - 1/2)) = ceil(1.4375) = 2; span = (10 9/16 + 1/2) / 2 = 5 17/32.
    const t = tileLength(F(169, 16), F(15, 2), F(1, 2));
    expect(t.spans).toHaveLength(2);
    expect(t.span.toFraction(true)).toBe('5 17/32');
    expect(t.spans[1]!.start.toFraction(true)).toBe('5 1/32');
    expect(t.spans[1]!.end.toFraction(true)).toBe('10 9/16');
    expect(t.joins.map((j) => j.toFraction(true))).toEqual(['5 17/32']);
    // Joined: the first part up to the join, then the second from the join: 5 17/32 + 5 1/32 = 10 9/16.
    expect(t.joins[0]!.add(t.spans[1]!.end.sub(t.joins[0]!)).equals(F(169, 16))).toBe(true);
  });

  it('a length that fits is one part with no join', () => {
    const t = tileLength(F(6), F(15, 2));
    expect(t.spans).toEqual([{ start: F(0), end: F(6) }]);
    expect(t.joins).toEqual([]);
  });

  it('25 in on 7 1/2 in with 1/2 in overlaps takes 4 parts (25 - 1/2) / 7 = 3.5 -> 4 (worked by hand)', () => {
    const t = tileLength(F(25), F(15, 2), F(1, 2));
    expect(t.spans).toHaveLength(4);
    // (25 + 3 x 1/2) / 4 = 6 5/8.
    expect(t.span.toFraction(true)).toBe('6 5/8');
  });

  it('parts never exceed the printable length, overlap by exactly o and add up to L (property; exact fractions)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 2000 }), fc.integer({ min: 40, max: 400 }), fc.integer({ min: 0, max: 16 }), (l32, m32, o32) => {
        const L = F(l32, 32);
        const M = F(m32, 32);
        const o = F(o32, 32);
        const t = tileLength(L, M, o);
        if (t.spans.length === 1) return L.compare(M) <= 0;
        const n = t.spans.length;
        const fewer = L.add(o.mul(n - 2)).div(n - 1);
        return (
          t.spans.every((s) => s.end.sub(s.start).compare(M) <= 0) &&
          t.spans.slice(1).every((s, k) => t.spans[k]!.end.sub(s.start).equals(o)) &&
          t.spans[0]!.start.equals(0) &&
          t.spans[n - 1]!.end.equals(L) &&
          // The fewest parts: one part fewer would be longer than the page.
          fewer.compare(M) > 0
        );
      }),
    );
  });

  it('refuses a printable length no longer than the overlap', () => {
    expect(() => tileLength(F(10), F(1, 2), F(1, 2))).toThrow(RangeError);
    expect(() => tileLength(F(0), F(5))).toThrow(RangeError);
  });
});

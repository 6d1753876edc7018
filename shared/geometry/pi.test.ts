import Fraction from 'fraction.js';
import { all, create, type BigNumber } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { piBounds } from './pi';

// Reference: mathjs BigNumber pi (decimal.js) at 120 significant digits.
const math = create(all, { number: 'BigNumber', precision: 120 });
const PI_110 = new Fraction((math.pi as unknown as BigNumber).toFixed(110));

describe('piBounds', () => {
  it.each([20, 40, 60, 100])('brackets pi (checked against mathjs BigNumber pi) at %i digits', (digits) => {
    const { lo, hi } = piBounds(digits);
    expect(lo.lt(PI_110)).toBe(true);
    expect(hi.gt(PI_110)).toBe(true);
    expect(hi.sub(lo).lt(new Fraction(1n, 10n ** BigInt(digits - 3)))).toBe(true);
  });

  it('starts 3.14159265358979323846 (known digits of pi)', () => {
    expect(piBounds(40).lo.toString(20)).toBe('3.14159265358979323846');
  });
});

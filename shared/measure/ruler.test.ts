import Fraction from 'fraction.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { inches, length, millimetres, serializeLength, toInches } from './length';
import { describeOffRuler, isOnRuler, nearestMark, roundToMark, roundUpToMark } from './ruler';

describe('ruler marks (M3, M4)', () => {
  it('a third of an inch is off the ruler: nearest 5/16, 1/48 in (0.53 mm) over', () => {
    const m = nearestMark(inches([1, 3]), 16);
    expect(m.onRuler).toBe(false);
    expect(serializeLength(m.mark)).toBe('5/16 in');
    // 1/3 - 5/16 = 1/48 in; x 25.4 mm/in (NIST SP 811) = 0.529166... mm
    expect(m.errorInches.equals(new Fraction(1, 48))).toBe(true);
    expect(m.errorMm.equals(new Fraction(254, 480))).toBe(true);
  });

  it('0.37 in sits just under 3/8', () => {
    const m = nearestMark(inches('0.37'), 16);
    expect(serializeLength(m.mark)).toBe('3/8 in');
    expect(m.errorInches.equals(new Fraction(-5, 1000))).toBe(true);
    expect(describeOffRuler('Width', inches('0.37'), 16)).toBe('Width 0.37 in is between the 1/16 in marks: nearest 3/8 in, 0.005 in (0.13 mm) under');
  });

  it('13 mm shown in inches is off the ruler (13 / 25.4 = 0.5118 in)', () => {
    const m = nearestMark(millimetres(13), 16);
    expect(serializeLength(m.mark)).toBe('1/2 in');
    expect(m.errorInches.equals(new Fraction(65, 127).sub(new Fraction(1, 2)))).toBe(true);
    expect(describeOffRuler('Score line at', millimetres(13), 16)).toBe(
      'Score line at 13 mm (0.5118 in) is between the 1/16 in marks: nearest 1/2 in, 0.0118 in (0.3 mm) over',
    );
  });

  it('precision decides what is on the ruler', () => {
    expect(isOnRuler(inches([3, 16]), 8)).toBe(false);
    expect(isOnRuler(inches([3, 16]), 16)).toBe(true);
    expect(isOnRuler(inches([5, 32]), 16)).toBe(false);
    expect(isOnRuler(inches([5, 32]), 32)).toBe(true);
    expect(isOnRuler(millimetres('25.4'), 8)).toBe(true); // exactly 1 in
    expect(describeOffRuler('Width', inches([17, 4]), 16)).toBeNull();
  });

  it('the metric ruler has whole millimetre marks', () => {
    expect(isOnRuler(millimetres(13), 16, 'metric')).toBe(true);
    const m = nearestMark(inches([1, 3]), 16, 'metric');
    // 1/3 in = 8.4666... mm
    expect(serializeLength(m.mark)).toBe('8 mm');
    expect(m.errorMm.equals(new Fraction(127, 15).sub(8))).toBe(true);
  });

  it('rounds up and to nearest on the ruler (property: the mark brackets the value)', () => {
    expect(serializeLength(roundUpToMark(inches('10.5138'), 16))).toBe('169/16 in');
    expect(serializeLength(roundUpToMark(inches([169, 16]), 16))).toBe('169/16 in');
    expect(serializeLength(roundToMark(inches([1, 32]), 16))).toBe('1/16 in'); // ties go up
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 100000 }), fc.integer({ min: 1, max: 997 }), fc.constantFrom(8, 16, 32) as fc.Arbitrary<8 | 16 | 32>, (n, d, p) => {
        const l = length(new Fraction(n, d), 'in');
        const up = toInches(roundUpToMark(l, p));
        expect(up.gte(toInches(l))).toBe(true);
        expect(up.sub(new Fraction(1, p)).lt(toInches(l))).toBe(true);
        const near = nearestMark(l, p);
        expect(near.errorInches.abs().lte(new Fraction(1, 2 * p))).toBe(true);
      }),
    );
  });
});

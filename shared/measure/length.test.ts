import Fraction from 'fraction.js';
import fc from 'fast-check';
import { unit as mathUnit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import {
  addLengths,
  centimetres,
  compareLengths,
  convertLength,
  formatLength,
  formatMm,
  inches,
  inchesNumber,
  length,
  lengthsEqual,
  millimetres,
  parseStoredLength,
  sameLength,
  serializeLength,
  subtractLengths,
  toInches,
  toMm,
  type LengthUnit,
} from './length';

describe('exact units', () => {
  it('1 in is exactly 25.4 mm (NIST SP 811, Appendix B)', () => {
    expect(lengthsEqual(inches(1), millimetres('25.4'))).toBe(true);
    expect(toInches(millimetres(1)).equals(new Fraction(5, 127))).toBe(true);
    expect(toMm(inches(1)).equals(new Fraction(254, 10))).toBe(true);
    expect(lengthsEqual(centimetres('2.54'), inches(1))).toBe(true);
  });

  it('1 mil = 0.001 in = 0.0254 mm (NIST SP 811)', () => {
    expect(toMm(inches('0.001')).equals(new Fraction('0.0254'))).toBe(true);
  });

  it('does not drift: ten thousand 1/10 mm steps make exactly 1000 mm', () => {
    let l = millimetres(0);
    for (let i = 0; i < 10_000; i++) l = addLengths(l, millimetres([1, 10]));
    expect(l.value.equals(1000)).toBe(true);
  });

  it('agrees with mathjs unit conversion (cross-check)', () => {
    const cases: [number, LengthUnit, string][] = [
      [13, 'mm', 'mm'],
      [268.2875, 'mm', 'mm'],
      [4.5, 'cm', 'cm'],
      [10.5625, 'in', 'inch'],
      [297, 'mm', 'mm'],
    ];
    for (const [v, u, mu] of cases) {
      const ours = inchesNumber(length(String(v), u));
      const theirs = mathUnit(v, mu).toNumber('inch');
      expect(ours).toBeCloseTo(theirs, 12);
    }
  });

  it('adds across units in exact inches and keeps a shared unit', () => {
    const sum = addLengths(inches(1), millimetres('25.4'));
    expect(sum.unit).toBe('in');
    expect(sum.value.equals(2)).toBe(true);
    const mm = addLengths(millimetres(3), millimetres(10));
    expect(mm.unit).toBe('mm');
    expect(mm.value.equals(13)).toBe(true);
    expect(subtractLengths(inches([1, 2]), inches([3, 8])).value.equals(new Fraction(1, 8))).toBe(true);
    expect(compareLengths(millimetres(13), inches([1, 2]))).toBeGreaterThan(0);
    expect(convertLength(inches(1), 'cm').value.equals(new Fraction('2.54'))).toBe(true);
  });
});

describe('display', () => {
  it('shows inches as a crafter writes them', () => {
    expect(formatLength(inches([169, 16]))).toBe('10 9/16 in');
    expect(formatLength(inches([3, 8]))).toBe('3/8 in');
    expect(formatLength(inches(12))).toBe('12 in');
    expect(formatLength(inches(0))).toBe('0 in');
    expect(formatLength(inches([-1, 8]))).toBe('-1/8 in');
  });

  it('keeps odd fractions exact and decimals decimal', () => {
    expect(formatLength(inches([1, 3]))).toBe('1/3 in');
    expect(formatLength(inches([13, 3]))).toBe('4 1/3 in');
    expect(formatLength(inches('0.37'))).toBe('0.37 in');
    expect(formatLength(inches('0.012'))).toBe('0.012 in');
  });

  it('shows metric lengths in their own unit', () => {
    expect(formatLength(millimetres(13))).toBe('13 mm');
    expect(formatLength(millimetres('2.5'))).toBe('2.5 mm');
    expect(formatLength(centimetres('4.5'))).toBe('4.5 cm');
    expect(formatLength(millimetres([1, 3]))).toBe('1/3 mm');
  });

  it('gives millimetres beside inches, rounded for display only', () => {
    // 10 9/16 in = 268.2875 mm exactly (x 25.4)
    expect(formatMm(inches([169, 16]))).toBe('268.3 mm');
    expect(formatMm(inches(1))).toBe('25.4 mm');
    expect(formatMm(inches(5))).toBe('127 mm');
    expect(formatMm(inches([1, 8]), 2)).toBe('3.18 mm');
  });
});

describe('storage round trip', () => {
  it('serializes compactly and exactly', () => {
    expect(serializeLength(inches([169, 16]))).toBe('169/16 in');
    expect(serializeLength(millimetres(13))).toBe('13 mm');
    expect(serializeLength(centimetres('2.5'))).toBe('5/2 cm');
    expect(serializeLength(inches([-1, 8]))).toBe('-1/8 in');
  });

  it('reads back exactly what it wrote, unit included (property)', () => {
    const unitArb = fc.constantFrom<LengthUnit>('in', 'mm', 'cm');
    fc.assert(
      fc.property(fc.bigInt({ min: -(10n ** 30n), max: 10n ** 30n }), fc.bigInt({ min: 1n, max: 10n ** 20n }), unitArb, (n, d, u) => {
        const l = length(new Fraction(n, d), u);
        const back = parseStoredLength(serializeLength(l));
        expect(sameLength(back, l)).toBe(true);
      }),
    );
  });

  it('refuses anything it did not write', () => {
    for (const bad of ['', '10 9/16 in', '3/0 in', '12in', '12 ft', ' 1 in', '1.5 in', 'abc']) {
      expect(() => parseStoredLength(bad)).toThrow(SyntaxError);
    }
  });
});

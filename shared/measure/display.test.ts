import { describe, expect, it } from 'vitest';
import { displayLength, lengthSummary } from './display';
import { centimetres, inches, millimetres, parseStoredLength, sameLength } from './length';

describe('displayLength', () => {
  it('inches as written, millimetres beside (x 25.4, NIST SP 811)', () => {
    expect(displayLength(inches([169, 16]))).toEqual({ primary: '10 9/16 in', secondary: '268.3 mm' });
    expect(displayLength(inches([3, 8]))).toEqual({ primary: '3/8 in', secondary: '9.5 mm' });
  });

  it('metric as written, the nearest inch mark beside', () => {
    expect(displayLength(millimetres(13))).toEqual({ primary: '13 mm', secondary: '≈ 1/2 in' });
    expect(displayLength(centimetres('2.54'))).toEqual({ primary: '2.54 cm', secondary: '1 in' });
    expect(displayLength(millimetres(13), 32)).toEqual({ primary: '13 mm', secondary: '≈ 1/2 in' });
    expect(displayLength(millimetres(10), 32)).toEqual({ primary: '10 mm', secondary: '≈ 13/32 in' });
  });
});

describe('lengthSummary', () => {
  it('is plain JSON and round-trips through the stored form', () => {
    const s = lengthSummary(inches([169, 16]));
    expect(JSON.parse(JSON.stringify(s))).toEqual({ stored: '169/16 in', display: '10 9/16 in', inches: 10.5625, mm: 268.2875 });
    expect(sameLength(parseStoredLength(s.stored), inches([169, 16]))).toBe(true);
  });
});

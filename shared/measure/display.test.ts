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

  it('a length below half a ruler mark (a caliper) shows in decimals, never as 0', () => {
    // 0.3 mm / 25.4 mm per in = 0.01181 in (NIST SP 811: 1 in = 25.4 mm exactly).
    expect(displayLength(millimetres('0.3'))).toEqual({ primary: '0.3 mm', secondary: '≈ 0.012 in' });
    // 0.25 mm = 0.00984 in; 1/1000 in = 0.0254 mm.
    expect(displayLength(millimetres('0.25'), 32).secondary).toBe('≈ 0.0098 in');
    expect(displayLength(inches([1, 1000])).secondary).toBe('0.025 mm');
    expect(displayLength(millimetres(0)).secondary).toBe('0 in');
  });
});

describe('lengthSummary', () => {
  it('is plain JSON and round-trips through the stored form', () => {
    const s = lengthSummary(inches([169, 16]));
    expect(JSON.parse(JSON.stringify(s))).toEqual({ stored: '169/16 in', display: '10 9/16 in', inches: 10.5625, mm: 268.2875 });
    expect(sameLength(parseStoredLength(s.stored), inches([169, 16]))).toBe(true);
  });
});

import { describe, expect, it } from 'vitest';
import { lengthTextProblem, MAX_LENGTH, readBoundedLength, storedLengthOrNull } from './bounds';
import { formatLength, toInches, toMm } from './length';

describe('length bounds', () => {
  it('sets the upper bound at 10 m = 10,000 mm = 393 89/127 in (1 in = 25.4 mm exactly, NIST SP 811)', () => {
    expect(toMm(MAX_LENGTH).valueOf()).toBe(10_000);
    expect(toInches(MAX_LENGTH).toFraction(true)).toBe('393 89/127');
    expect(readBoundedLength('10000 mm').ok).toBe(true);
    expect(readBoundedLength('1000 cm').ok).toBe(true);
    expect(readBoundedLength('393 in').ok).toBe(true);
    expect(readBoundedLength('394 in').ok).toBe(false);
  });

  it('refuses a minus sign in front, in any of its forms, instead of dropping it', () => {
    for (const t of ['-3 in', '− 3', '–3 mm', 'minus 3 inches', 'Negative three', '-0.5']) {
      const r = readBoundedLength(t);
      expect(r.ok, t).toBe(false);
      if (!r.ok) expect(r.message, t).toMatch(/cannot be negative/);
    }
  });

  it('refuses zero unless the field allows none (an overlap), and keeps the exact reading otherwise', () => {
    expect(lengthTextProblem('0', { defaultUnit: 'in' })).toBe('Enter a length above zero');
    expect(lengthTextProblem('zero', { defaultUnit: 'in', allowZero: true })).toBeNull();
    const r = readBoundedLength('ten and nine sixteenths');
    expect(r.ok && formatLength(r.length)).toBe('10 9/16 in');
  });

  it('without a unit, refuses a bare number only when it is out of bounds in inches and millimetres alike', () => {
    expect(lengthTextProblem('400')).toBeNull(); // 400 mm is fine, 400 in is not: the server decides with the tutorial's unit
    expect(lengthTextProblem('400', { defaultUnit: 'in' })).toMatch(/at most 10 m/);
    expect(lengthTextProblem('20000')).toMatch(/at most 10 m/);
    expect(lengthTextProblem('0.001')).toBeNull();
    expect(lengthTextProblem('0.001 mm')).toMatch(/Too small/);
  });

  it('reads stored lengths only when they parse and lie in bounds', () => {
    expect(storedLengthOrNull('169/16 in')).not.toBeNull();
    for (const bad of ['-3 in', '0 mm', '123456789012345678901234567890 in', 'twelve-ish', '', null, 42])
      expect(storedLengthOrNull(bad), String(bad)).toBeNull();
  });
});

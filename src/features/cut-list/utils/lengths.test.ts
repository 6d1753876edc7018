import { describe, expect, it } from 'vitest';
import { unit } from 'mathjs';
import { readTyped, showLength } from './lengths';
import type { LengthDto } from '@shared/schemas/piece';

const dto = (value: string): LengthDto => ({ value, inches: 0, mm: 0, display: '', mmDisplay: '' });

describe('readTyped', () => {
  it('previews a spoken mixed number in inches with millimetres (1 in = 25.4 mm, NIST SP 811 App. B)', () => {
    const r = readTyped('ten and a half');
    expect(r.state).toBe('ok');
    // 10.5 x 25.4 = 266.7 mm; cross-checked with mathjs units
    expect(unit(10.5, 'inch').toNumber('mm')).toBeCloseTo(266.7, 6);
    if (r.state === 'ok') expect(r.preview).toBe('→ 10 1/2 in · 266.7 mm');
  });

  it('previews ten and nine sixteenths as 268.3 mm (10.5625 x 25.4 = 268.2875, NIST SP 811)', () => {
    const r = readTyped('ten and nine sixteenths');
    expect(unit(10.5625, 'inch').toNumber('mm')).toBeCloseTo(268.2875, 6);
    expect(r.state === 'ok' && r.preview).toBe('→ 10 9/16 in · 268.3 mm');
  });

  it('keeps a metric length metric and shows the nearest 1/16 in mark beside it (108 mm = 4.252 in, NIST SP 811)', () => {
    const r = readTyped('108 mm');
    expect(unit(108, 'mm').toNumber('inch')).toBeCloseTo(4.252, 3);
    expect(r.state === 'ok' && r.preview).toBe('→ 108 mm · ≈ 4 1/4 in');
  });

  it('reads a bare number in the tutorial default unit', () => {
    const r = readTyped('4 1/4', 'mm');
    expect(r.state === 'ok' && r.preview.startsWith('→ 4.25 mm · ')).toBe(true);
  });

  it('says in words when it cannot read the text, and is empty for blank input', () => {
    const r = readTyped('a bit more than the lid');
    expect(r.state).toBe('error');
    if (r.state === 'error') expect(r.message).toContain('Could not read “a bit more than the lid”');
    expect(readTyped('   ').state).toBe('empty');
  });
});

describe('showLength', () => {
  it('shows both systems, inches only or millimetres only', () => {
    expect(showLength(dto('169/16 in'), 'both')).toEqual({ primary: '10 9/16 in', secondary: '268.3 mm' });
    expect(showLength(dto('169/16 in'), 'in')).toEqual({ primary: '10 9/16 in', secondary: null });
    expect(showLength(dto('169/16 in'), 'mm')).toEqual({ primary: '268.3 mm', secondary: null });
  });

  it('shows a metric length in inches by its nearest ruler mark (13 mm = 0.512 in, nearest 1/2 at 1/16, NIST SP 811)', () => {
    expect(unit(13, 'mm').toNumber('inch')).toBeCloseTo(0.5118, 4);
    expect(showLength(dto('13 mm'), 'in')).toEqual({ primary: '≈ 1/2 in', secondary: null });
    expect(showLength(dto('13 mm'), 'both')).toEqual({ primary: '13 mm', secondary: '≈ 1/2 in' });
    // at 1/32 the nearest mark of 0.5118 in is 16/32 = 1/2 still; at 1/8 also 1/2
    expect(showLength(dto('13 mm'), 'in', 32).primary).toBe('≈ 1/2 in');
  });
});

describe('bounds in the preview', () => {
  it('says “-3 in” is negative rather than previewing 3 in; zero and past 10 m are refused too', () => {
    expect(readTyped('-3 in')).toEqual({ state: 'error', message: 'A length cannot be negative; leave out the minus sign' });
    expect(readTyped('0')).toEqual({ state: 'error', message: 'Enter a length above zero' });
    const far = readTyped('400');
    expect(far.state === 'error' && far.message).toMatch(/at most 10 m/);
    // In a metric tutorial the same bare number is 400 mm.
    expect(readTyped('400', 'mm').state).toBe('ok');
  });
});

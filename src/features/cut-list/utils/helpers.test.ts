import { describe, expect, it } from 'vitest';
import { ceil, pi } from 'mathjs';
import { formatLength, formatMm } from '@shared/measure';
import { runCardBase, runLid, runWrap } from './helpers';

const ctx = { unit: 'in' as const, precision: 16 as const };

describe('runWrap', () => {
  it('wraps a 6 3/8 in circle with 2 strips and 1/2 in overlap: 10 9/16 in (worked example; mathjs pi cross-check)', () => {
    // pi x 6.375 / 2 + 0.5 = 10.5137..., rounded up to the 1/16 mark (common practice: cut long)
    const expected = (ceil(((pi * 6.375) / 2 + 0.5) * 16) as number) / 16;
    expect(expected).toBe(10.5625);
    const r = runWrap({ diameter: '6 3/8', strips: '2', overlap: '1/2', thickness: '' }, ctx);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(formatLength(r.result.stripLength)).toBe('10 9/16 in');
      expect(r.result.working.length).toBeGreaterThan(2);
    }
  });

  it('reads spoken inputs and adds paper thickness along the mean diameter (REFERENCES: pi x (d + t))', () => {
    const r = runWrap({ diameter: 'four inches', strips: '', overlap: 'half an inch', thickness: '0.3 mm' }, ctx);
    // pi x (4 + 0.3/25.4) + 0.5 = 13.1035 in, next 1/16 mark 13 2/16 = 13 1/8
    const expected = (ceil((pi * (4 + 0.3 / 25.4) + 0.5) * 16) as number) / 16;
    expect(expected).toBe(13.125);
    expect(r.ok && formatLength(r.result.stripLength)).toBe('13 1/8 in');
  });

  it('names each field it cannot read and refuses a fractional strip count', () => {
    const r = runWrap({ diameter: '', strips: '1.5', overlap: 'lots', thickness: '' }, ctx);
    expect(r).toEqual({ ok: false, errors: { diameter: 'Enter the diameter', overlap: 'Could not read “lots” as a length', strips: 'Use a whole number of strips from 1 to 99' } });
  });

  it('passes the engine refusal of a zero diameter on in words', () => {
    const r = runWrap({ diameter: '0', strips: '1', overlap: '', thickness: '' }, ctx);
    expect(r).toEqual({ ok: false, errors: { diameter: 'The diameter must be above zero' } });
  });
});

describe('runLid', () => {
  it('cuts a lid about 1/16 in larger than a 4 in base with the default clearance (common practice)', () => {
    const r = runLid({ diameter: '4', wall: '', clearance: '' }, ctx);
    expect(r.ok && formatLength(r.result.lidDiameter)).toBe('4 1/16 in');
  });

  it('adds the wall on both sides', () => {
    // 4 + 2 x 1/32 + 2 x 1/32 = 4 1/8 (REFERENCES: about the wall thickness on each side)
    const r = runLid({ diameter: '4', wall: '1/32', clearance: '1/32' }, ctx);
    expect(r.ok && formatLength(r.result.lidDiameter)).toBe('4 1/8 in');
  });
});

describe('runCardBase', () => {
  it('folds an A2 card 4 1/4 x 5 1/2 from 8 1/2 x 5 1/2 scored at 4 1/4 (REFERENCES, common practice)', () => {
    const r = runCardBase({ width: '4 1/4', height: '5 1/2', fold: 'side' }, ctx);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(formatLength(r.result.flatWidth)).toBe('8 1/2 in');
      expect(formatMm(r.result.flatWidth)).toBe('215.9 mm');
      expect(r.result.scoreLines.map((s) => `${s.axis} ${formatLength(s.at)}`)).toEqual(['width 4 1/4 in']);
    }
  });

  it('asks for missing sizes', () => {
    expect(runCardBase({ width: '', height: '5', fold: 'top' }, ctx)).toEqual({ ok: false, errors: { width: 'Enter the finished width' } });
  });
});

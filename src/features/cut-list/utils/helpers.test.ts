import { describe, expect, it } from 'vitest';
import { ceil, pi } from 'mathjs';
import { formatLength, formatMm } from '@shared/measure';
import { runCardBase, runLid, runWrap, wrapNote } from './helpers';

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

  it("writes the strip's note with each length in display form and its unit, however it was typed", () => {
    expect(wrapNote({ diameter: '3.5', strips: '1', overlap: '', thickness: '' }, ctx)).toBe('Wraps a 3 1/2 in circle');
    expect(wrapNote({ diameter: 'three and a half inches', strips: '2', overlap: '0.5', thickness: '' }, ctx)).toBe(
      'Wraps a 3 1/2 in circle in 2 strips with 1/2 in overlap each',
    );
    expect(wrapNote({ diameter: '90', strips: '1', overlap: '0', thickness: '' }, { unit: 'mm', precision: 16 })).toBe('Wraps a 90 mm circle');
  });

  it('names each field it cannot read and refuses a fractional strip count', () => {
    const r = runWrap({ diameter: '', strips: '1.5', overlap: 'lots', thickness: '' }, ctx);
    expect(r).toEqual({
      ok: false,
      errors: {
        diameter: 'Enter the diameter',
        overlap: 'Could not read “lots” as a length; try “4 1/4”, “ten and a half” or “108 mm”',
        strips: 'Use a whole number of strips from 1 to 99',
      },
    });
  });

  it('passes the engine refusal of a zero diameter on in words', () => {
    const r = runWrap({ diameter: '0', strips: '1', overlap: '', thickness: '' }, ctx);
    expect(r).toEqual({ ok: false, errors: { diameter: 'Enter a length above zero' } });
  });

  it('refuses “-3 in” in words instead of reading it as 3 in, on every field; no overlap may be none', () => {
    const r = runWrap({ diameter: '-3 in', strips: '1', overlap: '−1/2', thickness: 'minus 0.2 mm' }, ctx);
    const negative = 'A length cannot be negative; leave out the minus sign';
    expect(r).toEqual({ ok: false, errors: { diameter: negative, overlap: negative, thickness: negative } });
    expect(runWrap({ diameter: '3', strips: '1', overlap: '0', thickness: '0 mm' }, ctx).ok).toBe(true);
  });

  it('refuses a diameter past 10 m (a slip of the unit or a digit)', () => {
    const r = runWrap({ diameter: '1234567', strips: '1', overlap: '', thickness: '' }, ctx);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.errors.diameter).toMatch(/at most 10 m/);
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

describe('bounds on the other helpers', () => {
  it('refuses negative and past-10 m sizes in the lid and card base helpers', () => {
    const lid = runLid({ diameter: '4', wall: '-1/32', clearance: '' }, ctx);
    expect(lid).toEqual({ ok: false, errors: { wall: 'A length cannot be negative; leave out the minus sign' } });
    const card = runCardBase({ width: '-4 1/4', height: '99999 cm', fold: 'side' }, ctx);
    expect(card.ok).toBe(false);
    if (!card.ok) {
      expect(card.errors.width).toMatch(/cannot be negative/);
      expect(card.errors.height).toMatch(/at most 10 m/);
    }
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

  it('reads the relief, caliper, shutter flap and stopper the fold uses, and ignores the rest (worked by hand)', () => {
    // Tri-fold 4 x 6 in, 1/8 in relief, 0.5 mm caliper: tucked panel 4 - 1/8 - 0.0197 = 3.8553 in, down to the 1/16 mark: 3 13/16 in.
    const tri = runCardBase({ width: '4', height: '6', fold: 'tri-fold', relief: '1/8', caliper: '0.5 mm', stopper: 'nonsense' }, ctx);
    expect(tri.ok && tri.result.panels.map((p) => formatLength(p.size))).toEqual(['4 in', '4 in', '3 13/16 in']);
    // Shutter 5 x 7 in with 1 in outer flaps: inner (5 - 1/16) / 2 = 2 15/32, down to 2 7/16; flat 2 x (1 + 2 7/16) + 5 = 11 7/8 in.
    const shutter = runCardBase({ width: '5', height: '7', fold: 'shutter', outerFlap: '1' }, ctx);
    expect(shutter.ok && formatLength(shutter.result.flatWidth)).toBe('11 7/8 in');
    // An outer flap wider than the inner one is refused on its own field, in words.
    const wide = runCardBase({ width: '5', height: '7', fold: 'shutter', outerFlap: '3' }, ctx);
    expect(wide.ok === false && wide.errors.outerFlap).toMatch(/cannot be wider than the inner flap/);
    // Easel 5 x 7 in with the stopper 2 in from the bottom edge: arccos(5 / 7) = 44.4 degrees.
    const easel = runCardBase({ width: '5', height: '7', fold: 'easel', stopper: '2' }, ctx);
    expect(easel.ok && easel.result.stopper!.leanDegrees).toBeCloseTo((Math.acos(5 / 7) * 180) / Math.PI, 9);
    expect(runCardBase({ width: '5', height: '7', fold: 'easel', stopper: 'halfway' }, ctx)).toEqual({
      ok: false,
      errors: { stopper: 'Could not read “halfway” as a length; try “4 1/4”, “ten and a half” or “108 mm”' },
    });
  });
});

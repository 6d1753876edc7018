import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { inches, millimetres, serializeLength, toInches } from '../measure/length';
import { parseLength } from '../measure/parse-length';
import { notchMarks } from './notches';

const L = (s: string) => parseLength(s)!;

describe('notchMarks', () => {
  it('10 9/16 in tab at 1/2 in: 21 notches, the first and last 9/32 in from the ends (worked by hand)', () => {
    // 10 9/16 / 1/2 = 21.125 -> 21 notches span 20 x 1/2 = 10 in; (10 9/16 - 10) / 2 = 9/32 in at each end.
    const r = notchMarks({ length: L('10 9/16') });
    expect(r.count).toBe(21);
    expect(serializeLength(r.endGap)).toBe('9/32 in');
    expect(serializeLength(r.positions[0]!)).toBe('9/32 in');
    expect(serializeLength(r.positions[20]!)).toBe('329/32 in');
    expect(r.working.join('\n')).toContain('Notch every 1/2 in (12.7 mm), centred: the first and last 9/32 in (7.1 mm) from the ends');
  });

  it('an exact multiple leaves half a spacing at each end: 10 in at 1/2 in gives 20 notches, 1/4 in from the ends', () => {
    const r = notchMarks({ length: inches(10) });
    expect(r.count).toBe(20);
    expect(serializeLength(r.endGap)).toBe('1/4 in');
  });

  it('a metric strip: 270 mm at 12.7 mm (1/2 in) gives 21 notches and end gaps in millimetres', () => {
    // 270 / 12.7 = 21.26 -> 21 notches; (270 - 20 x 12.7) / 2 = 8 mm.
    const r = notchMarks({ length: millimetres(270) });
    expect(r.count).toBe(21);
    expect(serializeLength(r.endGap)).toBe('8 mm');
  });

  it('never leaves an end piece narrower than half the spacing, nor as wide as a whole one (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 4000 }), fc.integer({ min: 1, max: 64 }), (n32, s32) => {
        const r = notchMarks({ length: inches([n32, 32]), spacing: inches([s32, 32]) });
        const s = toInches(r.spacing);
        const e = toInches(r.endGap);
        if (r.count === 0) return inches([n32, 32]).value.compare(s) < 0;
        const sum = e.mul(2).add(s.mul(r.count - 1));
        return e.compare(s.div(2)) >= 0 && e.compare(s) < 0 && sum.equals(toInches(inches([n32, 32])));
      }),
    );
  });

  it('a tab shorter than the spacing needs no notch; bad input is refused', () => {
    expect(notchMarks({ length: L('3/8') }).count).toBe(0);
    expect(() => notchMarks({ length: L('0') })).toThrow(RangeError);
    expect(() => notchMarks({ length: L('2'), spacing: L('0') })).toThrow(RangeError);
  });
});

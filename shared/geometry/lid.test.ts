import { describe, expect, it } from 'vitest';
import { inches, serializeLength } from '../measure/length';
import { parseLength } from '../measure/parse-length';
import { lidCircle } from './lid';

const L = (s: string) => parseLength(s)!;

describe('lidCircle (M5)', () => {
  it('with the default clearance a lid is 1/16 in larger than the base (common practice for cardstock)', () => {
    const r = lidCircle({ diameter: L('4') });
    expect(serializeLength(r.lidDiameter)).toBe('65/16 in');
  });

  it('adds the wall on both sides, then rounds up: 4 + 2(0.012) + 2(1/32) = 4.0865 -> 4 1/8 (16ths), 4 3/32 (32nds)', () => {
    expect(serializeLength(lidCircle({ diameter: L('4'), wall: L('0.012') }).lidDiameter)).toBe('33/8 in');
    const fine = lidCircle({ diameter: L('4'), wall: L('0.012'), precision: 32 });
    expect(serializeLength(fine.lidDiameter)).toBe('131/32 in');
    expect(fine.working.join('\n')).toContain('4.0865');
  });

  it('with no wall and no clearance the lid equals the base when the base is on the ruler', () => {
    expect(serializeLength(lidCircle({ diameter: L('3 1/2'), clearance: inches(0) }).lidDiameter)).toBe('7/2 in');
  });

  it('refuses a zero base', () => {
    expect(() => lidCircle({ diameter: inches(0) })).toThrow(RangeError);
  });
});

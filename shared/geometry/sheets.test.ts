import Fraction from 'fraction.js';
import { unit as mathUnit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { inchesNumber, serializeLength, toInches } from '../measure/length';
import { SHEET_SIZES, sheetSize } from './sheets';

const size = (id: string) => {
  const s = sheetSize(id)!;
  return `${serializeLength(s.width)} x ${serializeLength(s.height)}`;
};

describe('sheet table', () => {
  it('ISO 216 A sizes in whole millimetres', () => {
    expect(size('a3')).toBe('297 mm x 420 mm');
    expect(size('a4')).toBe('210 mm x 297 mm');
    expect(size('a5')).toBe('148 mm x 210 mm');
    expect(size('a6')).toBe('105 mm x 148 mm');
  });

  it('ISO 216: each size’s long side is the next larger size’s short side', () => {
    const chain = ['a3', 'a4', 'a5', 'a6'].map((id) => sheetSize(id)!);
    for (let i = 1; i < chain.length; i++) expect(chain[i]!.height.value.equals(chain[i - 1]!.width.value)).toBe(true);
  });

  it('US sizes (ANSI/ASME Y14.1): Letter 8.5 x 11, Legal 8.5 x 14, Tabloid 11 x 17 in', () => {
    expect(size('letter')).toBe('17/2 in x 11 in');
    expect(size('legal')).toBe('17/2 in x 14 in');
    expect(size('tabloid')).toBe('11 in x 17 in');
  });

  it('12 x 12 in scrapbook paper (common practice)', () => {
    expect(size('12x12')).toBe('12 in x 12 in');
  });

  it('PDF page sizes in points (1 pt = 1/72 in): Letter 612 x 792, A4 595.28 x 841.89', () => {
    const pt = (id: string) => {
      const s = sheetSize(id)!;
      return [toInches(s.width).mul(72), toInches(s.height).mul(72)];
    };
    expect(pt('letter').map((f) => f.valueOf())).toEqual([612, 792]);
    expect(pt('a4').map((f) => f.round(2).toString())).toEqual(['595.28', '841.89']);
  });

  it('agrees with mathjs mm -> inch conversion for every metric sheet', () => {
    for (const s of SHEET_SIZES.filter((x) => x.width.unit === 'mm')) {
      expect(inchesNumber(s.width)).toBeCloseTo(mathUnit(s.width.value.valueOf(), 'mm').toNumber('inch'), 12);
    }
  });

  it('every sheet is portrait and names its source', () => {
    for (const s of SHEET_SIZES) {
      expect(toInches(s.width).lte(toInches(s.height))).toBe(true);
      expect(s.source.length).toBeGreaterThan(0);
      expect(toInches(s.width).gt(new Fraction(0))).toBe(true);
    }
    expect(sheetSize('A4')?.id).toBe('a4');
    expect(sheetSize('nope')).toBeUndefined();
  });
});

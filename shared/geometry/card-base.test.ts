import { describe, expect, it } from 'vitest';
import { checkPiece } from '../measure/checks';
import { compareLengths, serializeLength, sumLengths } from '../measure/length';
import { parseLength } from '../measure/parse-length';
import type { Piece } from '../measure/piece';
import { cardBase, FOLD_STYLES } from './card-base';
import { sheetSize } from './sheets';

const L = (s: string) => parseLength(s)!;
const flat = (r: ReturnType<typeof cardBase>) => ({
  w: serializeLength(r.flatWidth),
  h: serializeLength(r.flatHeight),
  scores: r.scoreLines.map((s) => `${s.axis} ${serializeLength(s.at)}`),
});

describe('cardBase (M5)', () => {
  it('A2 side fold: 4 1/4 x 5 1/2 finished -> 8 1/2 x 5 1/2 flat scored at 4 1/4 (common practice)', () => {
    expect(flat(cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'side' }))).toEqual({ w: '17/2 in', h: '11/2 in', scores: ['width 17/4 in'] });
  });

  it('the A2 flat base is half a Letter sheet (ANSI 8.5 x 11 in)', () => {
    const r = cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'side' });
    const letter = sheetSize('letter')!;
    expect(compareLengths(r.flatWidth, letter.width)).toBe(0);
    expect(r.flatHeight.value.mul(2).equals(letter.height.value)).toBe(true);
  });

  it('the finished A2 card fits an A2 envelope, 4 3/8 x 5 3/4 in (PWG 5101.1 na_a2_4.375x5.75in)', () => {
    expect(compareLengths(L('4 1/4'), L('4 3/8'))).toBeLessThan(0);
    expect(compareLengths(L('5 1/2'), L('5 3/4'))).toBeLessThan(0);
  });

  it('A2 top fold: 4 1/4 x 11 flat scored at 5 1/2 (common practice)', () => {
    expect(flat(cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'top' }))).toEqual({ w: '17/4 in', h: '11 in', scores: ['height 11/2 in'] });
  });

  it('gatefold: flaps meet in the middle with the 1/16 in relief, cut down to the ruler (worked by hand)', () => {
    // (4 1/4 - 1/16) / 2 = 2 3/32; down to the 1/16 in ruler: 2 1/16, leaving a 1/8 in gap; 2 1/16 + 4 1/4 + 2 1/16 = 8 3/8.
    const r = cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'gatefold' });
    expect(flat(r)).toEqual({ w: '67/8 in', h: '11/2 in', scores: ['width 33/16 in', 'width 101/16 in'] });
    expect(r.working.join('\n')).toContain('leave a 1/8 in (3.2 mm) gap');
    // On a 1/32 in ruler the flap keeps its exact share: 2 3/32 + 4 1/4 + 2 3/32 = 8 7/16, scored at 2 3/32 and 6 11/32.
    expect(flat(cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'gatefold', precision: 32 }))).toEqual({
      w: '135/16 in',
      h: '11/2 in',
      scores: ['width 67/32 in', 'width 203/32 in'],
    });
  });

  it('gatefold with no relief: flaps of exactly half the width meet edge to edge (2 1/8 + 4 1/4 + 2 1/8 = 8 1/2)', () => {
    expect(flat(cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'gatefold', relief: L('0') }))).toEqual({
      w: '17/2 in',
      h: '11/2 in',
      scores: ['width 17/8 in', 'width 51/8 in'],
    });
  });

  it('z-fold: three equal panels, 4 x 5 1/4 finished -> 12 x 5 1/4 flat scored at 4 and 8 (worked by hand)', () => {
    const r = cardBase({ width: L('4'), height: L('5 1/4'), fold: 'z-fold' });
    expect(flat(r)).toEqual({ w: '12 in', h: '21/4 in', scores: ['width 4 in', 'width 8 in'] });
    expect(r.panels.map((p) => serializeLength(p.size))).toEqual(['4 in', '4 in', '4 in']);
  });

  it('tri-fold: the tucked panel is narrower by the relief, and by the caliper of the fold around it (worked by hand)', () => {
    // 3 1/2 + 3 1/2 + (3 1/2 - 1/16 = 3 7/16) = 10 7/16, scored at 3 1/2 and 7.
    const plain = cardBase({ width: L('3 1/2'), height: L('5'), fold: 'tri-fold' });
    expect(flat(plain)).toEqual({ w: '167/16 in', h: '5 in', scores: ['width 7/2 in', 'width 7 in'] });
    expect(plain.panels.map((p) => serializeLength(p.size))).toEqual(['7/2 in', '7/2 in', '55/16 in']);
    // 0.3 mm stock (about 110 lb index, JCP K10 lists 0.290 mm): 3 7/16 - 0.0118 = 3.4257 in, down to 3 3/8 on a 1/16 ruler.
    const heavy = cardBase({ width: L('3 1/2'), height: L('5'), fold: 'tri-fold', caliper: L('0.3 mm') });
    expect(serializeLength(heavy.panels[2]!.size)).toBe('27/8 in');
    // 3 1/2 + 3 1/2 + 3 3/8 = 10 3/8.
    expect(serializeLength(heavy.flatWidth)).toBe('83/8 in');
    expect(heavy.working.join('\n')).toContain('fold allowance');
    // On a 1/32 in ruler: 3.4257 in -> 3 13/32 in.
    expect(serializeLength(cardBase({ width: L('3 1/2'), height: L('5'), fold: 'tri-fold', caliper: L('0.3 mm'), precision: 32 }).panels[2]!.size)).toBe(
      '109/32 in',
    );
  });

  it('shutter with no relief is the usual 12 in shutter card: scores at 2, 4, 8 and 10 in (common practice)', () => {
    expect(flat(cardBase({ width: L('4'), height: L('7'), fold: 'shutter', relief: L('0') }))).toEqual({
      w: '12 in',
      h: '7 in',
      scores: ['width 2 in', 'width 4 in', 'width 8 in', 'width 10 in'],
    });
  });

  it('shutter: inner flaps leave the relief where their folds meet; outer flaps may be narrower (worked by hand)', () => {
    // (4 - 1/16) / 2 = 1 31/32 -> 1 15/16; 2 x (1 15/16 + 1 15/16) + 4 = 11 3/4.
    expect(flat(cardBase({ width: L('4'), height: L('7'), fold: 'shutter' }))).toEqual({
      w: '47/4 in',
      h: '7 in',
      scores: ['width 31/16 in', 'width 31/8 in', 'width 63/8 in', 'width 157/16 in'],
    });
    // Stepped: outer flaps 1 1/2: 2 x (1 1/2 + 1 15/16) + 4 = 10 7/8, scored at 1 1/2, 3 7/16, 7 7/16 and 7 7/16 + 1 15/16 = 9 3/8.
    expect(flat(cardBase({ width: L('4'), height: L('7'), fold: 'shutter', outerFlap: L('1 1/2') }))).toEqual({
      w: '87/8 in',
      h: '7 in',
      scores: ['width 3/2 in', 'width 55/16 in', 'width 119/16 in', 'width 75/8 in'],
    });
    expect(() => cardBase({ width: L('4'), height: L('7'), fold: 'shutter', outerFlap: L('2') })).toThrow(/cannot be wider than the inner flap/);
  });

  it('easel: a top fold scored again at the middle of the front; the stopper at half the height stands it at 60° (worked by hand)', () => {
    // 5 1/2 x 4 1/4 landscape: flat 5 1/2 x 8 1/2, scored at 4 1/4 and 4 1/4 + 2 1/8 = 6 3/8.
    const r = cardBase({ width: L('5 1/2'), height: L('4 1/4'), fold: 'easel' });
    expect(flat(r)).toEqual({ w: '11/2 in', h: '17/2 in', scores: ['height 17/4 in', 'height 51/8 in'] });
    // Two half-panels of 2 1/8 and 2 1/8 of base: an equilateral triangle, 60°.
    expect(serializeLength(r.stopper!.fromEdge)).toBe('17/8 in');
    expect(r.stopper!.leanDegrees).toBeCloseTo(60, 6);
    // A stopper 1 in from the bottom edge: 3 1/4 in from the fold, arccos(3 1/4 / 4 1/4) = arccos(13/17) = 40.1° (by hand).
    const low = cardBase({ width: L('5 1/2'), height: L('4 1/4'), fold: 'easel', stopper: L('1') });
    expect(serializeLength(low.stopper!.fromFold)).toBe('13/4 in');
    expect(low.stopper!.leanDegrees).toBeCloseTo(40.1, 1);
    expect(() => cardBase({ width: L('5 1/2'), height: L('4 1/4'), fold: 'easel', stopper: L('4 1/4') })).toThrow(/stopper must sit on the base/);
  });

  it('every fold style gives a base that passes the piece checks, with folds along the grain', () => {
    for (const fold of FOLD_STYLES) {
      const r = cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold });
      const p: Piece = {
        id: fold,
        name: fold,
        material: 'white',
        quantity: 1,
        shape: 'rect',
        width: r.flatWidth,
        height: r.flatHeight,
        scoreLines: r.scoreLines,
      };
      expect(checkPiece(p, { pieces: [p] }), fold).toEqual([]);
      // Panels add up to the flat size along the folding axis.
      const along = r.scoreLines[0]!.axis === 'width' ? r.flatWidth : r.flatHeight;
      expect(compareLengths(sumLengths(r.panels.map((x) => x.size)), along), fold).toBe(0);
    }
    // A side-folded A2 base (8 1/2 x 5 1/2) folds across its long side: the grain runs along its 5 1/2 in width.
    expect(cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'side' }).grain).toBe('width');
    expect(cardBase({ width: L('5 1/2'), height: L('4 1/4'), fold: 'top' }).grain).toBe('width');
    expect(cardBase({ width: L('3'), height: L('8'), fold: 'side' }).grain).toBe('length');
  });

  it('a 5 x 7 in side-fold card (fits the PWG na_5x7 size) is 10 x 7 flat, and passes the piece checks', () => {
    const r = cardBase({ width: L('5'), height: L('7'), fold: 'side' });
    const p: Piece = {
      id: 'b',
      name: 'Card base',
      material: 'white',
      quantity: 1,
      shape: 'rect',
      width: r.flatWidth,
      height: r.flatHeight,
      scoreLines: r.scoreLines,
    };
    expect(flat(r)).toEqual({ w: '10 in', h: '7 in', scores: ['width 5 in'] });
    expect(checkPiece(p, { pieces: [p] })).toEqual([]);
  });

  it('shows its working and refuses a zero size', () => {
    expect(cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'side' }).working.join('\n')).toContain('2 × 4 1/4 in = 8 1/2 in');
    expect(() => cardBase({ width: L('0'), height: L('5'), fold: 'top' })).toThrow(RangeError);
  });
});

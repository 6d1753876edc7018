import { describe, expect, it } from 'vitest';
import { checkPiece } from '../measure/checks';
import { compareLengths, serializeLength } from '../measure/length';
import { parseLength } from '../measure/parse-length';
import type { Piece } from '../measure/piece';
import { cardBase } from './card-base';
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

  it('gatefold: flaps of half the width meet in the middle', () => {
    expect(flat(cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'gatefold' }))).toEqual({ w: '17/2 in', h: '11/2 in', scores: ['width 17/8 in', 'width 51/8 in'] });
  });

  it('a 5 x 7 in side-fold card (fits the PWG na_5x7 size) is 10 x 7 flat, and passes the piece checks', () => {
    const r = cardBase({ width: L('5'), height: L('7'), fold: 'side' });
    const p: Piece = { id: 'b', name: 'Card base', material: 'white', quantity: 1, shape: 'rect', width: r.flatWidth, height: r.flatHeight, scoreLines: r.scoreLines };
    expect(flat(r)).toEqual({ w: '10 in', h: '7 in', scores: ['width 5 in'] });
    expect(checkPiece(p, { pieces: [p] })).toEqual([]);
  });

  it('shows its working and refuses a zero size', () => {
    expect(cardBase({ width: L('4 1/4'), height: L('5 1/2'), fold: 'side' }).working.join('\n')).toContain('2 × 4 1/4 in = 8 1/2 in');
    expect(() => cardBase({ width: L('0'), height: L('5'), fold: 'top' })).toThrow(RangeError);
  });
});

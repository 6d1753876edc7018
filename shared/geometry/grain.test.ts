import { describe, expect, it } from 'vitest';
import { inches } from '../measure/length';
import { checkPiece } from '../measure/checks';
import type { Piece } from '../measure/piece';
import { allowedOrientations, pieceGrainAxis } from './grain';

// Common practice: paper folds and bends cleanly with its grain, so a wall that wraps a circle
// is cut with the grain running round it (along the strip's length).
const strip = { width: inches([169, 16]), height: inches([5, 2]), grain: 'length' as const, name: 'Wall strip' };

describe('grain', () => {
  it('a piece’s length is its longer side; a square’s length is its height side', () => {
    expect(pieceGrainAxis(strip)).toBe('x');
    expect(pieceGrainAxis({ ...strip, grain: 'width' })).toBe('y');
    expect(pieceGrainAxis({ width: inches(3), height: inches(3), grain: 'length' })).toBe('y');
    expect(pieceGrainAxis({ ...strip, grain: 'any' })).toBeNull();
  });

  it('a grain-bound piece lies only the way that runs its grain with the sheet’s; any other piece as the material allows', () => {
    expect(allowedOrientations(strip, { rotate: true, grain: 'width' })).toEqual({ upright: true, turned: false });
    expect(allowedOrientations(strip, { rotate: true, grain: 'height' })).toEqual({ upright: false, turned: true });
    expect(allowedOrientations({ ...strip, grain: 'any' }, { rotate: true, grain: 'height' })).toEqual({ upright: true, turned: true });
    // A sheet of unknown grain cannot bind a piece.
    expect(allowedOrientations(strip, { rotate: false, grain: 'none' })).toEqual({ upright: true, turned: false });
    const stuck = allowedOrientations(strip, { rotate: false, grain: 'height' });
    expect(stuck.upright || stuck.turned).toBe(false);
    expect(stuck.reason).toBe('"Wall strip" needs its grain along its length, which lies across the sheet\'s grain, and turning is off for this material');
  });

  it('the piece checks say when the grain cannot be honoured on the stock sheet', () => {
    const p: Piece = { id: 'w', material: 'kraft', quantity: 1, shape: 'rect', scoreLines: [], ...strip };
    // On a 12 x 12 in sheet with its grain down the height, the strip must turn: fine when turning is on.
    expect(checkPiece(p, { pieces: [p], stock: { width: inches(12), height: inches(12), rotate: true, grain: 'height' } })).toEqual([]);
    const off = checkPiece(p, { pieces: [p], stock: { width: inches(12), height: inches(12), rotate: false, grain: 'height' } });
    expect(off.map((c) => c.code)).toEqual(['grain-against-stock']);
    // On Letter (8 1/2 x 11) with long grain, the strip fits only along the 11 in height: with the grain there, it turns.
    const letter = { width: inches([17, 2]), height: inches(11), rotate: true };
    expect(checkPiece(p, { pieces: [p], stock: { ...letter, grain: 'height' } })).toEqual([]);
    // With short grain the strip would have to lie across the 8 1/2 in width, which it does not fit.
    expect(checkPiece(p, { pieces: [p], stock: { ...letter, grain: 'width' } }).map((c) => c.reason)).toEqual([
      '"Wall strip" fits the 8 1/2 x 11 in stock sheet only turned across its grain; it needs its grain along its length',
    ]);
  });
});

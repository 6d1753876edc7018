import { describe, expect, it } from 'vitest';
import { blockCells, labelSize, patternLabel } from './sheet-drawing';

describe('blockCells', () => {
  it('spreads a block of 3 x 2 tags one tag width and height apart', () => {
    const cells = blockCells({
      name: 'tag',
      x: 1,
      y: 0.5,
      width: 2,
      height: 3.5,
      rotated: false,
      shape: 'rect',
      outline: null,
      grain: 'any',
      across: 3,
      down: 2,
    });
    expect(cells.map((c) => [c.x, c.y])).toEqual([
      [1, 0.5],
      [3, 0.5],
      [5, 0.5],
      [1, 4],
      [3, 4],
      [5, 4],
    ]);
  });
});

describe('patternLabel', () => {
  it('names one sheet or a run of alike sheets', () => {
    expect(patternLabel(3, 1)).toBe('Sheet 3');
    expect(patternLabel(1, 7)).toBe('Sheets 1–7');
  });
});

describe('labelSize', () => {
  it('fits the label to the piece and drops it on slivers', () => {
    expect(labelSize({ name: 'Lid', width: 6, height: 6 })).toBe(0.45);
    expect(labelSize({ name: 'Wall strip', width: 10.5, height: 2 })).toBe(0.45);
    // a long name on a small tag shrinks to fit across it
    const s = labelSize({ name: 'A very long tag name', width: 2, height: 1 })!;
    expect(s * 20 * 0.55).toBeLessThanOrEqual(2 * 0.9 + 1e-9);
    expect(labelSize({ name: 'Slit', width: 0.25, height: 3 })).toBeNull();
  });
});

import { describe, expect, it } from 'vitest';
import { labelSize, placementsBySheet } from './sheet-drawing';
import type { PlacementDto } from '../api/types';

const at = (sheet: number, name: string, width = 4, height = 4): PlacementDto => ({ sheet, name, x: 0, y: 0, width, height, rotated: false, shape: 'rect' });

describe('placementsBySheet', () => {
  it('groups placements by sheet and keeps empty sheets', () => {
    const r = placementsBySheet([at(0, 'a'), at(2, 'b'), at(0, 'c')], 3);
    expect(r.map((s) => s.map((p) => p.name))).toEqual([['a', 'c'], [], ['b']]);
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

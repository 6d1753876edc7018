import { describe, expect, it } from 'vitest';
import { groupSupplies } from '@shared/editor/render-parts';
import { canMove, groupByCategory, moveSupply, positionChanges } from './supply-order';

// The supplies of an invented gatefold birthday card, in list order.
const list = [
  { id: 'a', position: 0, category: 'cardstock', name: 'White cardstock' },
  { id: 'b', position: 1, category: 'tool', name: 'Bone folder' },
  { id: 'c', position: 2, category: 'paper', name: 'Confetti patterned paper' },
  { id: 'd', position: 3, category: 'tool', name: 'Paper trimmer' },
  { id: 'e', position: 5, category: 'adhesive', name: 'Foam tape' },
  { id: 'f', position: 6, category: 'cardstock', name: 'Gold mirror cardstock' },
];
const withOther = [...list, { id: 'g', position: 7, category: 'other', name: 'Distress ink' }];
const ids = (xs: { id: string }[] | null) => xs?.map((x) => x.id) ?? null;

describe('groupByCategory', () => {
  it('groups exactly as the write-up and exports do (cross-checked with the shared renderer groupSupplies)', () => {
    const ours = groupByCategory(list).map((g) => [g.category, g.label, g.items.map((s) => s.name)]);
    const theirs = groupSupplies(list).map((g) => [g.category, g.label, g.items.map((s) => s.name)]);
    expect(ours).toEqual(theirs);
    expect(ours).toEqual([
      ['paper', 'Paper', ['Confetti patterned paper']],
      ['cardstock', 'Cardstock', ['White cardstock', 'Gold mirror cardstock']],
      ['adhesive', 'Adhesives', ['Foam tape']],
      ['tool', 'Tools', ['Bone folder', 'Paper trimmer']],
    ]);
    expect(groupByCategory(withOther).map((g) => g.label)).toEqual(groupSupplies(withOther).map((g) => g.label));
  });
});

describe('moveSupply', () => {
  it('swaps with the neighbour in list order', () => {
    expect(ids(moveSupply(list, 'c', -1))).toEqual(['a', 'c', 'b', 'd', 'e', 'f']);
    expect(ids(moveSupply(list, 'c', 1))).toEqual(['a', 'b', 'd', 'c', 'e', 'f']);
  });
  it('inside a category, swaps with the nearest supply of that category', () => {
    expect(ids(moveSupply(list, 'd', -1, true))).toEqual(['a', 'd', 'c', 'b', 'e', 'f']);
    expect(ids(moveSupply(list, 'a', 1, true))).toEqual(['f', 'b', 'c', 'd', 'e', 'a']);
  });
  it('cannot move past either end', () => {
    expect(moveSupply(list, 'a', -1)).toBeNull();
    expect(moveSupply(list, 'f', 1)).toBeNull();
    expect(canMove(list, 'b', -1, true)).toBe(false);
    expect(canMove(list, 'e', 1, true)).toBe(false);
    expect(canMove(list, 'e', 1)).toBe(true);
    expect(moveSupply(list, 'nope', 1)).toBeNull();
  });
});

describe('positionChanges', () => {
  it('renumbers only what differs, mending gaps', () => {
    expect(positionChanges(moveSupply(list, 'c', -1)!)).toEqual([
      { id: 'c', position: 1 },
      { id: 'b', position: 2 },
      { id: 'e', position: 4 },
      { id: 'f', position: 5 },
    ]);
    expect(positionChanges(list.slice(0, 4))).toEqual([]);
  });
});

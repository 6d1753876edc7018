import { describe, expect, it } from 'vitest';
import {
  readSheetCount,
  supplyMaterial,
  supplySheetChecks,
  unresolvedSheetWarnings,
  withSheetCount,
  type PlannedMaterial,
  type SupplyLine,
} from './sheet-checks';

const kraft: PlannedMaterial = { material: 'kraft cardstock', sheets: 3, sheetLabel: '12 x 12 in', complete: true };
const pattern: PlannedMaterial = { material: 'patterned paper', sheets: 1, sheetLabel: '12 x 12 in', complete: true };
const line = (over: Partial<SupplyLine> & Pick<SupplyLine, 'name' | 'quantity'>): SupplyLine => ({
  id: over.name,
  category: 'cardstock',
  acceptedSheetNeed: null,
  ...over,
});

describe('readSheetCount', () => {
  it('reads counts of sheets as crafters write them (common practice wording)', () => {
    expect(readSheetCount('2 sheets', 'cardstock')).toBe(2);
    expect(readSheetCount('two sheets', 'paper')).toBe(2);
    expect(readSheetCount('a sheet', 'paper')).toBe(1);
    expect(readSheetCount('1 sheet', 'tool')).toBe(1);
    expect(readSheetCount('3 x 12 x 12 in sheets', 'cardstock')).toBe(3);
    expect(readSheetCount('4 12x12 sheets', 'cardstock')).toBe(4);
    // Paper and cardstock come by the sheet, so a bare number counts them; glue does not.
    expect(readSheetCount('2', 'cardstock')).toBe(2);
    expect(readSheetCount('2', 'adhesive')).toBeNull();
  });

  it('does not read packs, vague amounts or an empty quantity as sheets', () => {
    expect(readSheetCount('1 pack of 10 sheets', 'cardstock')).toBeNull();
    expect(readSheetCount('a few', 'paper')).toBeNull();
    expect(readSheetCount('', 'paper')).toBeNull();
    expect(readSheetCount('a', 'paper')).toBeNull();
  });
});

describe('supplyMaterial', () => {
  it('finds the cut list material named in the supply, the longest when two match', () => {
    expect(supplyMaterial('Kraft cardstock, 12 x 12 in', ['kraft cardstock', 'patterned paper'])).toBe('kraft cardstock');
    expect(supplyMaterial('Dark kraft cardstock', ['cardstock', 'kraft cardstock'])).toBe('kraft cardstock');
    expect(supplyMaterial('Strong liquid glue', ['kraft cardstock'])).toBeNull();
    // Whole words only: "card" is not "cardstock".
    expect(supplyMaterial('Cardstock', ['card'])).toBeNull();
  });
});

describe('withSheetCount', () => {
  it('changes the count and keeps the crafter’s wording', () => {
    expect(withSheetCount('2 sheets', 3)).toBe('3 sheets');
    expect(withSheetCount('two sheets of 12 x 12', 3)).toBe('3 sheets of 12 x 12');
    expect(withSheetCount('1 sheet', 2)).toBe('2 sheets');
    expect(withSheetCount('2 sheets', 1)).toBe('1 sheet');
    expect(withSheetCount('2', 4)).toBe('4');
  });
});

describe('supplySheetChecks', () => {
  it('warns when the supplies list fewer sheets than the plan and offers the plan’s figure (the issue’s example: kraft 12 x 12, 2 sheets)', () => {
    const checks = supplySheetChecks(
      [line({ name: 'Kraft cardstock, 12 x 12 in', quantity: '2 sheets' }), line({ name: 'Patterned paper', quantity: '1 sheet', category: 'paper' })],
      [kraft, pattern],
    );
    expect(checks).toHaveLength(2);
    const k = checks.find((c) => c.material === 'kraft cardstock')!;
    expect(k).toMatchObject({ status: 'short', stated: 2, needed: 3, fix: { quantity: '3 sheets' } });
    expect(k.message).toBe('Kraft cardstock, 12 x 12 in: the supplies say 2 sheets, but the sheet plan needs 3 sheets of 12 x 12 in kraft cardstock');
    expect(checks.find((c) => c.material === 'patterned paper')).toMatchObject({ status: 'ok', fix: null });
    expect(unresolvedSheetWarnings(checks)).toEqual([k.message]);
  });

  it('holds an accepted shortfall while the plan needs the figure accepted, and warns again when it needs more', () => {
    const accepted = line({ name: 'Kraft cardstock', quantity: '2 sheets', acceptedSheetNeed: 3 });
    expect(supplySheetChecks([accepted], [kraft])[0]).toMatchObject({ status: 'accepted' });
    expect(unresolvedSheetWarnings(supplySheetChecks([accepted], [kraft]))).toEqual([]);
    expect(supplySheetChecks([accepted], [{ ...kraft, sheets: 4 }])[0]).toMatchObject({ status: 'short', needed: 4 });
  });

  it('adds up two lines of the same material and fixes the first so the total agrees', () => {
    const checks = supplySheetChecks(
      [line({ name: 'Kraft cardstock (base)', quantity: '1 sheet' }), line({ name: 'Kraft cardstock (lid)', quantity: '1 sheet' })],
      [kraft],
    );
    expect(checks).toHaveLength(1);
    expect(checks[0]).toMatchObject({ supplyName: 'Kraft cardstock (base)', stated: 2, needed: 3, fix: { quantity: '2 sheets' } });
  });

  it('says nothing when it cannot compare: no count, no planned material, or a plan with pieces that do not fit', () => {
    expect(supplySheetChecks([line({ name: 'Kraft cardstock', quantity: 'a pack' })], [kraft])).toEqual([]);
    expect(supplySheetChecks([line({ name: 'Vellum', quantity: '2 sheets' })], [kraft])).toEqual([]);
    expect(supplySheetChecks([line({ name: 'Kraft cardstock', quantity: '1 sheet' })], [{ ...kraft, complete: false }])).toEqual([]);
  });
});
